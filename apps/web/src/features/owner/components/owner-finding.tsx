import type { OwnerFinding } from '@benchproof/contracts';
import { DO_NOT_RIDE, formatMoney, INSPECTION_AREA_LABELS, URGENCY_LABELS } from '@benchproof/domain';
import { Alert, Badge, Button, Card, Group, Stack, Text } from '@mantine/core';
import { IconAlertOctagon, IconCheck, IconX } from '@tabler/icons-react';
import { ConditionBadge } from '../../../components/condition-badge';
import { Shots } from './shot-viewer';
import type { Choice } from './use-choices';

const DECIDED: Record<'approved' | 'declined', { label: string; color: string }> = {
  approved: { label: 'You approved this', color: 'teal' },
  declined: { label: 'You declined this', color: 'gray' },
};

interface Props {
  finding: OwnerFinding;
  choice: Choice | undefined;
  onChoose: (c: Choice) => void;
  /** The bike was handed back or the job cancelled: the page is for reading, no more answers. */
  closed?: boolean;
}

/** One finding in plain words, its photos, and — when priced — the owner's approve/decline choice. */
export function OwnerFindingCard({ finding: f, choice, onChoose, closed = false }: Props) {
  const rec = f.recommendation;
  const area = INSPECTION_AREA_LABELS[f.area];
  return (
    <Card withBorder radius="md" padding="md" data-testid={`owner-finding-${f.id}`}>
      <Stack gap="sm">
        <Group justify="space-between" wrap="nowrap" align="flex-start">
          <Text fw={700} size="lg">
            {area}
          </Text>
          <ConditionBadge condition={f.condition} />
        </Group>
        {f.doNotRide && (
          <Alert color="red.9" variant="filled" icon={<IconAlertOctagon />} title={DO_NOT_RIDE.toUpperCase()}>
            This is unsafe. Please do not ride the bike until it is fixed.
          </Alert>
        )}
        <Text>{f.description}</Text>
        <Shots shots={f.shots} label={area} />
        {rec && (
          <Stack gap={6}>
            <Group justify="space-between" wrap="nowrap" align="flex-start">
              <div>
                <Text fw={600}>{rec.summary}</Text>
                <Text size="sm" c="dimmed">
                  {URGENCY_LABELS[rec.urgency]}
                </Text>
              </div>
              <Text fw={700} size="lg" style={{ whiteSpace: 'nowrap' }}>
                {formatMoney(rec.totals.grossMinor, rec.currency)}
              </Text>
            </Group>
            <Choice rec={rec} choice={choice} onChoose={onChoose} closed={closed} />
          </Stack>
        )}
      </Stack>
    </Card>
  );
}

type ChoiceProps = { rec: NonNullable<Props['finding']['recommendation']>; choice: Props['choice']; onChoose: Props['onChoose']; closed: boolean };

/** Approve / Decline while the item is pending on an open job; the recorded answer once decided. */
function Choice({ rec, choice, onChoose, closed }: ChoiceProps) {
  if (closed && rec.decisionStatus === 'pending')
    return (
      <Badge size="lg" color="gray" variant="light">
        Not answered
      </Badge>
    );
  return rec.decisionStatus === 'pending' ? (
    <Group grow gap="sm">
      <Button
        size="lg"
        mih={52}
        color="teal.9"
        variant={choice === 'approved' ? 'filled' : 'outline'}
        leftSection={<IconCheck />}
        onClick={() => onChoose('approved')}
        aria-pressed={choice === 'approved'}
      >
        Approve
      </Button>
      <Button
        size="lg"
        mih={52}
        color="gray"
        variant={choice === 'declined' ? 'filled' : 'outline'}
        leftSection={<IconX />}
        onClick={() => onChoose('declined')}
        aria-pressed={choice === 'declined'}
      >
        Decline
      </Button>
    </Group>
  ) : (
    <Badge size="lg" color={DECIDED[rec.decisionStatus].color} variant="light">
      {DECIDED[rec.decisionStatus].label}
    </Badge>
  );
}
