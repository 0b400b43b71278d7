import type { TextMessageDto, TextStatus } from '@benchproof/contracts';
import { Alert, Anchor, Badge, Card, Group, Stack, Text, Title } from '@mantine/core';
import { IconAlertTriangle, IconBan, IconCheck, IconChecks, IconClockHour4, IconSend } from '@tabler/icons-react';
import { QueryState } from '../../../components/query-state';
import { useDates } from '../../../lib/dates';
import { Link } from 'react-router';
import { useCustomerTexts, useTexts } from '../api/texts';

const KIND_LABELS: Record<string, string> = {
  owner_link: 'Owner link',
  estimate_decision: 'Estimate for decision',
  ready_to_collect: 'Ready to collect',
};

/** Colour, icon and word together, so the status reads in greyscale and for colour-blind eyes. */
const LOOK: Record<TextStatus, { label: string; color: string; icon: typeof IconCheck }> = {
  queued: { label: 'Waiting to send', color: 'gray', icon: IconClockHour4 },
  sending: { label: 'Sending', color: 'blue', icon: IconSend },
  sent: { label: 'Sent, not yet confirmed', color: 'blue', icon: IconCheck },
  delivered: { label: 'Delivered to the phone', color: 'teal', icon: IconChecks },
  undelivered: { label: 'Not delivered', color: 'red', icon: IconAlertTriangle },
  failed: { label: 'Not sent', color: 'red', icon: IconAlertTriangle },
  opted_out: { label: 'Owner replied STOP', color: 'orange', icon: IconBan },
};

export function TextStatusBadge({ status }: { status: TextStatus }) {
  const { label, color, icon: Icon } = LOOK[status];
  const bad = status === 'failed' || status === 'undelivered';
  return (
    <Badge color={color} variant={bad ? 'filled' : 'light'} size="lg" radius="sm" leftSection={<Icon size={14} />} style={{ textTransform: 'none' }}>
      {label}
    </Badge>
  );
}

function TextCard({ m, withJob = false }: { m: TextMessageDto; withJob?: boolean }) {
  const dates = useDates();
  const stopped = m.status === 'failed' || m.status === 'undelivered';
  return (
    <Card withBorder radius="md" p="md" data-testid="text-message">
      <Stack gap={6}>
        <Group justify="space-between" gap="xs" wrap="wrap">
          <Text fw={700}>
            {KIND_LABELS[m.kind] ?? m.kind}
            {withJob && m.jobId !== null && (
              <Anchor component={Link} to={`/jobs/${m.jobId}`} fw={400} ml="xs">
                (open the job)
              </Anchor>
            )}
          </Text>
          <TextStatusBadge status={m.status} />
        </Group>
        <Text size="sm">To {m.to}</Text>
        <Text size="sm" c="dimmed" style={{ wordBreak: 'break-word' }}>
          {m.body}
        </Text>
        <Text size="sm" c="dimmed">
          Queued {dates.dateTime(m.createdAt)}
          {m.statusAt && m.status !== 'queued' ? ` · ${LOOK[m.status].label.toLowerCase()} ${dates.dateTime(m.statusAt)}` : ''}
          {m.attempts > 0 ? ` · attempt ${m.attempts} of ${m.maxAttempts}` : ''}
          {m.status === 'queued' && m.nextTryAt ? ` · next try ${dates.dateTime(m.nextTryAt)}` : ''}
        </Text>
        {m.lastError && m.status !== 'delivered' && (
          <Alert color={stopped ? 'red' : 'yellow'} variant="light" icon={<IconAlertTriangle />} p="xs">
            {stopped ? 'Stopped trying: ' : 'Last attempt failed: '}
            {m.lastError}
          </Alert>
        )}
      </Stack>
    </Card>
  );
}

/** Every text of the job and where it got to: waiting, sent, delivered to the phone, or not. */
export function TextsPanel({ jobId }: { jobId: number }) {
  const texts = useTexts(jobId);
  if (!texts.data) return <QueryState isLoading={texts.isLoading} error={texts.error} />;
  return (
    <Stack gap="sm">
      <Title order={3}>Texts to the owner</Title>
      {texts.data.length === 0 && <Text c="dimmed">No texts for this job. Owners who prefer texts get their link and "ready to collect" this way.</Text>}
      {texts.data.map((m) => (
        <TextCard key={m.id} m={m} />
      ))}
    </Stack>
  );
}

/** Every text to one customer across their jobs, so desk can see why one did not go (e.g. they replied STOP). */
export function CustomerTextsPanel({ customerId }: { customerId: number }) {
  const texts = useCustomerTexts(customerId);
  if (!texts.data) return <QueryState isLoading={texts.isLoading} error={texts.error} />;
  return (
    <Stack gap="sm" data-testid="customer-texts">
      <Title order={3}>Texts</Title>
      {texts.data.length === 0 && <Text c="dimmed">No texts to this customer yet.</Text>}
      {texts.data.map((m) => (
        <TextCard key={m.id} m={m} withJob />
      ))}
    </Stack>
  );
}
