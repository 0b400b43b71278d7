import { Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { QueryState } from '../../../components/query-state';
import { useEstimate } from '../api/findings';
import { EstimateItems } from './estimate-items';
import { formatMoney } from '@benchproof/domain';

function Total({ label, minor, currency, hint }: { label: string; minor: number; currency: string; hint: string }) {
  return (
    <Paper withBorder p="sm">
      <Text size="xs" tt="uppercase" fw={700} c="dimmed">
        {label}
      </Text>
      <Text fz="xl" fw={800}>
        {formatMoney(minor, currency)}
      </Text>
      <Text size="xs" c="dimmed">
        {hint}
      </Text>
    </Paper>
  );
}

/** The estimate as the owner's answers stand: approved, waiting, declined (gross, tax included). */
export function EstimateSummary({ jobId }: { jobId: number }) {
  const estimate = useEstimate(jobId);
  const e = estimate.data;
  if (!e) return <QueryState isLoading={estimate.isLoading} error={estimate.error} />;
  const count = (s: string) => e.items.filter((i) => i.recommendation.decisionStatus === s).length;
  return (
    <Stack gap="xs">
      <SimpleGrid cols={{ base: 2, sm: 4 }} spacing="xs">
        <Total label="Approved" minor={e.totals.approved.grossMinor} currency={e.currency} hint={`${count('approved')} item(s)`} />
        <Total label="Waiting" minor={e.totals.pending.grossMinor} currency={e.currency} hint={`${count('pending')} item(s)`} />
        <Total label="Declined" minor={e.totals.declined.grossMinor} currency={e.currency} hint={`${count('declined')} item(s)`} />
        <Total label="All quoted" minor={e.totals.all.grossMinor} currency={e.currency} hint={`tax ${formatMoney(e.totals.all.taxMinor, e.currency)}`} />
      </SimpleGrid>
      <EstimateItems estimate={e} />
    </Stack>
  );
}
