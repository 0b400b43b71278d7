import { RecommendationRequestSchema, type RecommendationDto } from '@benchproof/contracts';
import { defaultUrgency, type Condition, type EstimateLine, type Urgency, majorTextToMinor, minorToMajorText } from '@benchproof/domain';
import { useForm, type UseFormReturnType } from '@mantine/form';
import { contractResolver, formFailure, pathTable, showServerFieldErrors } from '../../../lib/form';
import { useSaveRecommendation } from '../api/findings';
import type { ShopRates } from './estimate-preview';

interface PartRow {
  description: string;
  qty: number | string;
  price: string;
}
interface Values {
  summary: string;
  urgency: Urgency;
  parts: PartRow[];
  hours: number | string;
}
export type RecommendationForm = UseFormReturnType<Values>;

export const emptyPart = (): PartRow => ({ description: '', qty: 1, price: '' });
/** Request paths → the boxes that hold them (minor units and hundredths are typed as major units and hours). */
const toField = (p: string) => pathTable({ labourHundredths: 'hours' })(p).replace(/^parts\.(\d+)\.unitPriceMinor$/, 'parts.$1.price');

function toRequest(v: Values, currency: string) {
  return {
    summary: v.summary,
    urgency: v.urgency,
    parts: v.parts.map((p) => ({ description: p.description, qty: Number(p.qty), unitPriceMinor: majorTextToMinor(p.price, currency) ?? Number.NaN })),
    labourHundredths: Math.round(Number(v.hours || 0) * 100),
  };
}

/** The estimate lines the values price to so far; a part without a valid price or quantity is left out of the preview. */
export function linesOf(v: Values, rates: ShopRates): EstimateLine[] {
  const parts: EstimateLine[] = v.parts.flatMap((p) => {
    const price = majorTextToMinor(p.price, rates.currency);
    const qty = Number(p.qty);
    return price === null || !(qty > 0) ? [] : [{ kind: 'part' as const, qty, unitPriceMinor: price }];
  });
  return [...parts, { kind: 'labour', hours: Number(v.hours || 0), rateMinorPerHour: rates.labourRateMinor }];
}

export interface RecommendationFormInput {
  jobId: number;
  findingId: number;
  condition: Condition;
  current: RecommendationDto | null;
  rates: ShopRates;
  onDone: () => void;
}

/**
 * The recommendation form: starts from the saved recommendation (or the urgency the condition suggests),
 * validates with the request's contract and puts server field errors under the boxes that hold them.
 */
export function useRecommendationForm({ jobId, findingId, condition, current, rates, onDone }: RecommendationFormInput) {
  const save = useSaveRecommendation(jobId, findingId);
  const form = useForm<Values>({
    mode: 'controlled',
    initialValues: {
      summary: current?.summary ?? '',
      urgency: current?.urgency ?? defaultUrgency(condition),
      parts: current?.parts.map((p) => ({ description: p.description, qty: p.qty, price: minorToMajorText(p.unitPriceMinor, rates.currency) })) ?? [],
      hours: current ? current.labourHundredths / 100 : 0.5,
    },
    validate: contractResolver(RecommendationRequestSchema, (v: Values) => toRequest(v, rates.currency), toField),
  });
  const submit = form.onSubmit((v) =>
    save.mutate(RecommendationRequestSchema.parse(toRequest(v, rates.currency)), {
      onSuccess: onDone,
      onError: (e) => showServerFieldErrors(form, e, toField),
    }),
  );
  return { form, submit, pending: save.isPending, failure: formFailure(save.error) };
}
