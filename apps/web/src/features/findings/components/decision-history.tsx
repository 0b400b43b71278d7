import type { DecisionDto } from '@benchproof/contracts';
import { Badge, Group, Stack, Text, Timeline } from '@mantine/core';
import { useDates } from '../../../lib/dates';

export const DECISION_LABELS: Record<DecisionDto['status'], string> = { pending: 'Pending', approved: 'Approved', declined: 'Declined' };
export const DECISION_COLOURS: Record<DecisionDto['status'], string> = { pending: 'gray', approved: 'teal', declined: 'red' };
const CHANNEL_LABELS: Record<DecisionDto['channel'], string> = {
  phone: 'by phone',
  in_person: 'in person',
  email: 'by e-mail',
  owner_link: 'on the owner page',
};

/** Every decision taken on a recommendation, newest first, with who decided and who recorded it. */
export function DecisionHistory({ decisions, staffName }: { decisions: DecisionDto[]; staffName: (id: number | null) => string }) {
  const dates = useDates();
  if (decisions.length === 0)
    return (
      <Text size="sm" c="dimmed">
        No decision yet.
      </Text>
    );
  const list = [...decisions].sort((a, b) => b.recordedAt.localeCompare(a.recordedAt));
  return (
    <Timeline bulletSize={14} lineWidth={2}>
      {list.map((d) => (
        <Timeline.Item key={d.id}>
          <Stack gap={0}>
            <Group gap="xs">
              <Badge color={DECISION_COLOURS[d.status]} variant="light" radius="sm">
                {DECISION_LABELS[d.status]}
              </Badge>
              <Text size="sm">
                {d.decidedByName} {CHANNEL_LABELS[d.channel]}
              </Text>
            </Group>
            <Text size="xs" c="dimmed">
              {dates.dateTime(d.decidedAt)}
              {d.recordedById !== null && ` · recorded by ${staffName(d.recordedById)} at ${dates.dateTime(d.recordedAt)}`}
            </Text>
            {d.note && <Text size="sm">{d.note}</Text>}
          </Stack>
        </Timeline.Item>
      ))}
    </Timeline>
  );
}
