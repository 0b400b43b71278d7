import { NumberInput, SimpleGrid } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import type { SettingsValues } from './settings-values';

/** The shop's own chain wear limits, each a percentage of elongation. */
const CHAIN_FIELDS = [
  { path: 'chain.replaceAt11Pct', label: 'Replace at, 11-speed and up' },
  { path: 'chain.replaceAt10Pct', label: 'Replace at, 10-speed and below' },
  { path: 'chain.cassettePct', label: 'Cassette likely worn at' },
] as const;

export function ChainLimitFields({ form }: { form: UseFormReturnType<SettingsValues> }) {
  return (
    <SimpleGrid cols={{ base: 1, sm: 3 }} spacing="sm">
      {CHAIN_FIELDS.map((f) => (
        <NumberInput key={f.path} label={f.label} suffix=" %" inputMode="decimal" step={0.05} decimalScale={2} min={0} {...form.getInputProps(f.path)} />
      ))}
    </SimpleGrid>
  );
}
