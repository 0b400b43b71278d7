import { URGENCIES, URGENCY_LABELS } from '@benchproof/domain';
import { ActionIcon, Alert, Button, Group, NumberInput, Paper, SegmentedControl, Stack, Text, TextInput } from '@mantine/core';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { EstimatePreview } from './estimate-preview';
import { emptyPart, linesOf, useRecommendationForm, type RecommendationForm, type RecommendationFormInput } from './use-recommendation-form';

const URGENCY_OPTIONS = URGENCIES.map((u) => ({ value: u, label: URGENCY_LABELS[u] }));

function PartLine({ form, i, currency }: { form: RecommendationForm; i: number; currency: string }) {
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

/** The parts list: one line per part, and a button to add another. */
function PartsFields({ form, currency }: { form: RecommendationForm; currency: string }) {
  return (
    <>
      <Text fw={600}>Parts</Text>
      {form.getValues().parts.map((_, i) => (
        <PartLine key={i} form={form} i={i} currency={currency} />
      ))}
      <Button variant="light" leftSection={<IconPlus />} onClick={() => form.insertListItem('parts', emptyPart())}>
        Add a part
      </Button>
    </>
  );
}

function UrgencyField({ form, findingId }: { form: RecommendationForm; findingId: number }) {
  return (
    <Stack gap={4}>
      <Text size="sm" fw={500} id={`urgency-${findingId}`}>
        Urgency
      </Text>
      <SegmentedControl fullWidth size="md" data={URGENCY_OPTIONS} aria-labelledby={`urgency-${findingId}`} {...form.getInputProps('urgency')} />
      <Text size="xs" c="dimmed">
        Starts from the finding’s condition; change it if the work is more or less pressing.
      </Text>
    </Stack>
  );
}

/** Parts and labour for one finding, priced live at the shop's rates. */
export function RecommendationEditor(props: RecommendationFormInput) {
  const { rates } = props;
  const { form, submit, pending, failure } = useRecommendationForm(props);
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && <Alert color="red">{failure}</Alert>}
        <TextInput label="What we recommend" withAsterisk {...form.getInputProps('summary')} />
        <UrgencyField form={form} findingId={props.findingId} />
        <PartsFields form={form} currency={rates.currency} />
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
          <EstimatePreview lines={linesOf(form.getValues(), rates)} rates={rates} />
        </Paper>
        <Text size="xs" c="dimmed">
          Prices are net; tax is added once on the total. The server stores the figures with the rates of today.
        </Text>
        <Button type="submit" size="lg" loading={pending}>
          Save recommendation
        </Button>
      </Stack>
    </form>
  );
}
