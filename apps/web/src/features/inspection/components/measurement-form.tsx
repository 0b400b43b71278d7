import type { MeasurementInputDto } from '@benchproof/contracts';
import { MEASUREMENT_KIND_LABELS, type ChainLimitPolicy, type MeasurementKind } from '@benchproof/domain';
import { Alert, Button, NumberInput, Paper, SegmentedControl, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconAlertTriangle, IconDeviceFloppy } from '@tabler/icons-react';
import { useState } from 'react';
import { ConditionBadge } from '../../../components/condition-badge';
import { liveVerdict, type LiveVerdict } from './live-verdict';
import { KIND_SPECS, type FieldSpec, type SpecContext, type Values } from './measurement-specs';

function Field({ spec, value, onChange }: { spec: FieldSpec; value: string; onChange: (v: string) => void }) {
  if (spec.type === 'choice') {
    return (
      <Stack gap={4}>
        <Text size="sm" fw={500}>
          {spec.label}
        </Text>
        <SegmentedControl fullWidth size="md" data={spec.options} value={value} onChange={onChange} aria-label={spec.label} />
      </Stack>
    );
  }
  return (
    <NumberInput
      label={spec.label}
      description={spec.description}
      inputMode="decimal"
      size="lg"
      step={spec.step}
      min={0}
      suffix={spec.suffix ? ` ${spec.suffix}` : undefined}
      decimalScale={4}
      value={value}
      onChange={(v) => onChange(String(v))}
    />
  );
}

export function VerdictView({ live }: { live: LiveVerdict }) {
  if (live.state === 'empty')
    return (
      <Text size="sm" c="dimmed">
        The verdict shows here as you type.
      </Text>
    );
  if (live.state === 'error')
    return (
      <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="status">
        {live.message}
      </Alert>
    );
  return (
    <Paper withBorder p="sm" role="status" aria-live="polite">
      <Stack gap={4}>
        <ConditionBadge condition={live.condition} size="lg" />
        {live.headline && (
          <Text fz="xl" fw={800}>
            {live.headline}
          </Text>
        )}
        <Text size="sm">{live.message}</Text>
      </Stack>
    </Paper>
  );
}

interface Props {
  kind: MeasurementKind;
  ctx: SpecContext;
  speeds: number;
  chainPolicy?: Partial<ChainLimitPolicy>;
  onSave?: (input: MeasurementInputDto) => void;
  saving?: boolean;
}

/** Typed entry for one kind of reading, with the live verdict computed by libs/domain. */
export function MeasurementForm({ kind, ctx, speeds, chainPolicy, onSave, saving }: Props) {
  const spec = KIND_SPECS[kind];
  const [values, setValues] = useState<Values>(() => spec.initial(ctx));
  const input = spec.build(values, ctx);
  const live = liveVerdict(input, speeds, chainPolicy);
  const set = (key: string) => (v: string) => setValues((prev) => ({ ...prev, [key]: v }));
  return (
    <Stack gap="sm">
      <Text fw={700}>{MEASUREMENT_KIND_LABELS[kind]}</Text>
      <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="sm">
        {spec.fields(values).map((f) => (
          <Field key={f.key} spec={f} value={values[f.key] ?? ''} onChange={set(f.key)} />
        ))}
      </SimpleGrid>
      <VerdictView live={live} />
      {onSave && (
        <Button size="lg" leftSection={<IconDeviceFloppy />} disabled={live.state !== 'ok' || !input} loading={saving} onClick={() => input && onSave(input)}>
          Save reading
        </Button>
      )}
    </Stack>
  );
}
