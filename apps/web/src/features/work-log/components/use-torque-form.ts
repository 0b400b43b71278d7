import { TorqueEntryRequestSchema } from '@benchproof/contracts';
import type { Threadlocker, TorqueUnit } from '@benchproof/domain';
import { useForm, type UseFormReturnType } from '@mantine/form';
import { contractResolver, formFailure, pathTable, showServerFieldErrors } from '../../../lib/form';
import { useAddTorqueEntry } from '../api/work-log';

interface Values {
  fastener: string;
  specSource: string;
  isRange: boolean;
  specMin: number | string;
  specMax: number | string;
  specUnit: TorqueUnit;
  applied: number | string;
  appliedUnit: TorqueUnit;
  tool: string;
  toolCalibratedOn: string | null;
  threadlocker: Threadlocker | null;
  carbonPart: boolean;
}

/** An empty number box is null, not 0. */
export const num = (v: number | string) => (v === '' ? null : Number(v));

function toRequest(v: Values) {
  return {
    fastener: v.fastener,
    specSource: v.specSource,
    specified: { min: num(v.specMin) ?? Number.NaN, max: v.isRange ? num(v.specMax) : null, unit: v.specUnit },
    applied: { value: num(v.applied) ?? Number.NaN, unit: v.appliedUnit },
    tool: v.tool,
    toolCalibratedOn: v.toolCalibratedOn ?? undefined,
    threadlocker: v.threadlocker ?? undefined,
    carbonPart: v.carbonPart,
  };
}

/** Request paths → the boxes that hold them. */
const toField = pathTable({
  'specified.min': 'specMin',
  'specified.max': 'specMax',
  'specified.unit': 'specUnit',
  'applied.value': 'applied',
  'applied.unit': 'appliedUnit',
});

const INITIAL: Values = {
  fastener: '',
  specSource: '',
  isRange: false,
  specMin: '',
  specMax: '',
  specUnit: 'nm',
  applied: '',
  appliedUnit: 'nm',
  tool: '',
  toolCalibratedOn: null,
  threadlocker: null,
  carbonPart: false,
};

export type TorqueFormState = UseFormReturnType<Values>;

/** The torque entry form: validated with the request's contract, cleared after each logged entry for the next fastener. */
export function useTorqueForm(jobId: number) {
  const add = useAddTorqueEntry(jobId);
  const form = useForm<Values>({
    mode: 'controlled',
    initialValues: INITIAL,
    validate: contractResolver(TorqueEntryRequestSchema, toRequest, toField),
  });
  const submit = form.onSubmit((values) =>
    add.mutate(TorqueEntryRequestSchema.parse(toRequest(values)), { onSuccess: () => form.reset(), onError: (e) => showServerFieldErrors(form, e, toField) }),
  );
  return { form, submit, pending: add.isPending, failure: formFailure(add.error) };
}
