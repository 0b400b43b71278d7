import type { EstimateDto } from '@benchproof/contracts';
import { DECLINED_SAFETY_NOTICE, INSPECTION_AREA_LABELS, URGENCIES, URGENCY_LABELS, type Urgency, formatMoney } from '@benchproof/domain';
import { Alert, Badge, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { DECISION_COLOURS, DECISION_LABELS } from './decision-history';
import { UrgencyBadge } from './urgency-badge';

type Item = EstimateDto['items'][number];

/** Declined work the mechanic marked safety-critical (or that fixes an unsafe finding) gets its own notice. */
export const isDeclinedSafety = (urgency: Urgency, decision: string, condition: string): boolean =>
  decision === 'declined' && (urgency === 'safety' || condition === 'unsafe');

function EstimateLine({ item, currency }: { item: Item; currency: string }) {
  const r = item.recommendation;
  return (
    <Paper withBorder p="xs">
      <Stack gap={4}>
        <Group justify="space-between" wrap="nowrap">
          <Stack gap={0}>
            <Text fw={600}>{r.summary}</Text>
            <Text size="xs" c="dimmed">
              {INSPECTION_AREA_LABELS[item.area]}
            </Text>
          </Stack>
          <Group gap="xs" wrap="nowrap">
            <UrgencyBadge urgency={r.urgency} />
            <Badge color={DECISION_COLOURS[r.decisionStatus]} variant="filled" radius="sm">
              {DECISION_LABELS[r.decisionStatus]}
            </Badge>
            <Text fw={700}>{formatMoney(r.totals.grossMinor, currency)}</Text>
          </Group>
        </Group>
        {isDeclinedSafety(r.urgency, r.decisionStatus, item.condition) && (
          <Alert color="red" variant="filled" p="xs">
            {DECLINED_SAFETY_NOTICE}
          </Alert>
        )}
      </Stack>
    </Paper>
  );
}

/** The estimate's lines grouped by urgency, most urgent first (CHECKS.md A.2 step 4). */
export function EstimateItems({ estimate }: { estimate: EstimateDto }) {
  const groups = URGENCIES.map((u) => ({ urgency: u, items: estimate.items.filter((i) => i.recommendation.urgency === u) })).filter((g) => g.items.length > 0);
  return (
    <Stack gap="sm">
      {groups.map((g) => (
        <Stack key={g.urgency} gap={6} role="group" aria-label={URGENCY_LABELS[g.urgency]}>
          <Title order={4} size="h5">
            {URGENCY_LABELS[g.urgency]}
          </Title>
          {g.items.map((i) => (
            <EstimateLine key={i.recommendation.id} item={i} currency={estimate.currency} />
          ))}
        </Stack>
      ))}
    </Stack>
  );
}
