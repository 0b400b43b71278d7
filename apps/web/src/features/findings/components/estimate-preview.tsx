import { estimateTotals, isDomainInputError, type EstimateLine, formatMoney } from '@benchproof/domain';
import { Group, Stack, Text } from '@mantine/core';

export interface ShopRates {
  labourRateMinor: number;
  taxRateBp: number;
  currency: string;
}

function Row({ label, value, strong }: { label: string; value: string; strong?: boolean }) {
  return (
    <Group justify="space-between">
      <Text size={strong ? 'lg' : 'sm'} fw={strong ? 800 : 500}>
        {label}
      </Text>
      <Text size={strong ? 'lg' : 'sm'} fw={strong ? 800 : 500}>
        {value}
      </Text>
    </Group>
  );
}

/** Live totals with libs/domain's money rules: lines rounded once each, tax once on the net. */
export function EstimatePreview({ lines, rates }: { lines: EstimateLine[]; rates: ShopRates }) {
  let totals;
  try {
    totals = estimateTotals(lines, rates.taxRateBp);
  } catch (e) {
    if (isDomainInputError(e))
      return (
        <Text c="red" size="sm">
          {e.message}
        </Text>
      );
    throw e;
  }
  const c = rates.currency;
  return (
    <Stack gap={2} aria-live="polite">
      <Row label="Parts" value={formatMoney(totals.partsMinor, c)} />
      <Row label={`Labour at ${formatMoney(rates.labourRateMinor, c)}/h`} value={formatMoney(totals.labourMinor, c)} />
      <Row label="Net" value={formatMoney(totals.netMinor, c)} />
      <Row label={`Tax ${(rates.taxRateBp / 100).toLocaleString('en-GB')} %`} value={formatMoney(totals.taxMinor, c)} />
      <Row label="Total" value={formatMoney(totals.grossMinor, c)} strong />
    </Stack>
  );
}
