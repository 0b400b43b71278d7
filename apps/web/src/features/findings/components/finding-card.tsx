import type { FindingDto } from '@benchproof/contracts';
import { DECLINED_SAFETY_NOTICE, defaultUrgency, INSPECTION_AREA_LABELS, formatMoney } from '@benchproof/domain';
import { Alert, Badge, Card, Group, Stack, Text } from '@mantine/core';
import type { ReactNode } from 'react';
import { ConditionBadge } from '../../../components/condition-badge';
import { SafetyNote } from '../../../components/safety-note';
import { DECISION_COLOURS, DECISION_LABELS, DecisionHistory } from './decision-history';
import { isDeclinedSafety } from './estimate-items';
import type { ShopRates } from './estimate-preview';
import { FindingActions } from './finding-actions';
import { UrgencyBadge } from './urgency-badge';

export interface FindingCardProps {
  jobId: number;
  finding: FindingDto;
  rates: ShopRates;
  canDecide: boolean;
  /** Mechanics and managers write findings; the desk prices and records answers. */
  canEdit: boolean;
  ownerName: string;
  me: { id: number; name: string };
  staffName: (id: number | null) => string;
  /** Slot for the finding's shots (the media feature's picker, composed in the route). */
  evidence?: (findingId: number) => ReactNode;
}

function Recommendation({ finding }: { finding: FindingDto }) {
  const r = finding.recommendation;
  if (!r)
    return (
      <Text size="sm" c="dimmed">
        No recommendation priced yet.
      </Text>
    );
  return (
    <Stack gap={4}>
      <Group justify="space-between" wrap="nowrap">
        <Text fw={600}>{r.summary}</Text>
        <Badge color={DECISION_COLOURS[r.decisionStatus]} variant="filled" radius="sm" size="lg">
          {DECISION_LABELS[r.decisionStatus]}
        </Badge>
      </Group>
      {r.parts.map((p, i) => (
        <Text key={i} size="sm">
          {p.qty} × {p.description} — {formatMoney(p.totalMinor, r.currency)}
        </Text>
      ))}
      <Text size="sm">
        Labour {(r.labourHundredths / 100).toLocaleString('en-GB')} h — {formatMoney(r.totals.labourMinor, r.currency)}
      </Text>
      <Text fw={800}>
        Total {formatMoney(r.totals.grossMinor, r.currency)}{' '}
        <Text span size="xs" c="dimmed">
          incl. tax {formatMoney(r.totals.taxMinor, r.currency)}
        </Text>
      </Text>
    </Stack>
  );
}

/** One finding with its priced recommendation, the owner's decision and its history. */
export function FindingCard({ jobId, finding, rates, canDecide, canEdit, ownerName, me, staffName, evidence }: FindingCardProps) {
  // Before it is priced, the finding shows the urgency its recommendation would start with.
  const urgency = finding.recommendation?.urgency ?? defaultUrgency(finding.condition);
  const declinedUnsafe = isDeclinedSafety(urgency, finding.recommendation?.decisionStatus ?? 'pending', finding.condition);
  return (
    <Card withBorder padding="md">
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start">
          <Stack gap={2}>
            <Text size="xs" tt="uppercase" fw={700} c="dimmed">
              {INSPECTION_AREA_LABELS[finding.area]}
            </Text>
            <ConditionBadge condition={finding.condition} />
          </Stack>
          <UrgencyBadge urgency={urgency} />
        </Group>
        <Text style={{ whiteSpace: 'pre-wrap' }}>{finding.description}</Text>
        {evidence?.(finding.id)}
        {finding.cautions.map((c) => (
          <SafetyNote key={c} text={c} />
        ))}
        {declinedUnsafe && (
          <Alert color="red" variant="filled">
            {DECLINED_SAFETY_NOTICE}
          </Alert>
        )}
        <Recommendation finding={finding} />
        {finding.recommendation && <DecisionHistory decisions={finding.recommendation.decisions} staffName={staffName} />}
        <FindingActions jobId={jobId} finding={finding} rates={rates} canDecide={canDecide} canEdit={canEdit} ownerName={ownerName} me={me} />
      </Stack>
    </Card>
  );
}
