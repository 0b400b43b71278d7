import { RecommendationRequestSchema, type RecommendationDto } from '@benchproof/contracts';
import {
  defaultUrgency,
  URGENCIES,
  URGENCY_LABELS,
  type Condition,
  type EstimateLine,
  type Urgency,
  majorTextToMinor,
  minorToMajorText,
} from '@benchproof/domain';
import { ActionIcon, Alert, Button, Group, NumberInput, Paper, SegmentedControl, Stack, Text, TextInput } from '@mantine/core';
import { useForm, type UseFormReturnType } from '@mantine/form';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { contractResolver, formFailure, pathTable, showServerFieldErrors } from '../../../lib/form';
import { useSaveRecommendation } from '../api/findings';
import { EstimatePreview, type ShopRates } from './estimate-preview';

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

const URGENCY_OPTIONS = URGENCIES.map((u) => ({ value: u, label: URGENCY_LABELS[u] }));
const emptyPart = (): PartRow => ({ description: '', qty: 1, price: '' });
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

function linesOf(v: Values, rates: ShopRates): EstimateLine[] {
  const parts: EstimateLine[] = v.parts.flatMap((p) => {
    const price = majorTextToMinor(p.price, rates.currency);
    const qty = Number(p.qty);
    return price === null || !(qty > 0) ? [] : [{ kind: 'part' as const, qty, unitPriceMinor: price }];
  });
  return [...parts, { kind: 'labour', hours: Number(v.hours || 0), rateMinorPerHour: rates.labourRateMinor }];
}

function PartLine({ form, i, currency }: { form: UseFormReturnType<Values>; i: number; currency: string }) {
  return (
    <Paper withBorder p="xs">
      <Stack gap="xs">
        <Group gap="xs" wrap="nowrap" align="flex-end">
          <TextInput label="Part" style={{ flex: 1 }} {...form.getInputProps(`parts.${i}.description`)} />
          <ActionIcon size={44} variant="light" color="red" aria-label="Remove part" onClick={() => form.removeListItem('parts', i)}>
            <IconTrash />
          </ActionIcon>
        </Group>
        <Group grow gap="xs">
          <NumberInput label="Qty" inputMode="decimal" min={0} step={1} decimalScale={4} {...form.getInputProps(`parts.${i}.qty`)} />
          <TextInput label={`Unit price (${currency})`} inputMode="decimal" placeholder="0.00" {...form.getInputProps(`parts.${i}.price`)} />
        </Group>
      </Stack>
    </Paper>
  );
}

/** Parts and labour for one finding, priced live at the shop's rates. */
export function RecommendationEditor({
  jobId,
  findingId,
  condition,
  current,
  rates,
  onDone,
}: {
  jobId: number;
  findingId: number;
  condition: Condition;
  current: RecommendationDto | null;
  rates: ShopRates;
  onDone: () => void;
}) {
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
  const failure = formFailure(save.error);
  const values = form.getValues();
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && <Alert color="red">{failure}</Alert>}
        <TextInput label="What we recommend" withAsterisk {...form.getInputProps('summary')} />
        <Stack gap={4}>
          <Text size="sm" fw={500} id={`urgency-${findingId}`}>
            Urgency
          </Text>
          <SegmentedControl fullWidth size="md" data={URGENCY_OPTIONS} aria-labelledby={`urgency-${findingId}`} {...form.getInputProps('urgency')} />
          <Text size="xs" c="dimmed">
            Starts from the finding’s condition; change it if the work is more or less pressing.
          </Text>
        </Stack>
        <Text fw={600}>Parts</Text>
        {values.parts.map((_, i) => (
          <PartLine key={i} form={form as unknown as UseFormReturnType<Values>} i={i} currency={rates.currency} />
        ))}
        <Button variant="light" leftSection={<IconPlus />} onClick={() => form.insertListItem('parts', emptyPart())}>
          Add a part
        </Button>
        <NumberInput
          label="Labour hours"
          description="In quarter hours"
          inputMode="decimal"
          min={0}
          step={0.25}
          decimalScale={2}
          size="lg"
          {...form.getInputProps('hours')}
        />
        <Paper withBorder p="sm" bg="gray.0">
          <EstimatePreview lines={linesOf(values, rates)} rates={rates} />
        </Paper>
        <Text size="xs" c="dimmed">
          Prices are net; tax is added once on the total. The server stores the figures with the rates of today.
        </Text>
        <Button type="submit" size="lg" loading={save.isPending}>
          Save recommendation
        </Button>
      </Stack>
    </form>
  );
}
