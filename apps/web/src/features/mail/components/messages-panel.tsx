import type { OutboxMessageDto } from '@benchproof/contracts';
import { Alert, Button, Card, Group, Stack, Text, Title } from '@mantine/core';
import { IconAlertTriangle, IconPaperclip, IconRefresh } from '@tabler/icons-react';
import { QueryState } from '../../../components/query-state';
import { ApiError } from '../../../lib/api-client';
import { useMessages, useResendMessage } from '../api/messages';
import { MessageStatus } from './message-status';
import { useDates } from '../../../lib/dates';

const KIND_LABELS: Record<string, string> = { report_ready: 'Bench report', estimate_decision: 'Estimate for decision' };

function MessageCard({ m, canResend, jobId }: { m: OutboxMessageDto; canResend: boolean; jobId: number }) {
  const dates = useDates();
  const resend = useResendMessage(jobId);
  const error = resend.error instanceof ApiError ? resend.error.message : resend.error ? 'The resend did not go through. Try again.' : null;
  return (
    <Card withBorder radius="md" p="md" data-testid="outbox-message">
      <Stack gap={6}>
        <Group justify="space-between" gap="xs" wrap="wrap">
          <Text fw={700}>{KIND_LABELS[m.kind] ?? m.kind}</Text>
          <MessageStatus status={m.status} />
        </Group>
        <Text size="sm" style={{ wordBreak: 'break-word' }}>
          To {m.to} · {m.subject}
        </Text>
        {m.attachments.map((a) => (
          <Group key={a.filename} gap={4} c="dimmed">
            <IconPaperclip size={14} />
            <Text size="sm">{a.filename}</Text>
          </Group>
        ))}
        <Text size="sm" c="dimmed">
          Queued {dates.dateTime(m.createdAt)}
          {m.sentAt ? ` · handed to the mail server ${dates.dateTime(m.sentAt)}` : ''}
          {m.attempts > 0 ? ` · attempt ${m.attempts} of ${m.maxAttempts}` : ''}
          {m.status === 'queued' && m.nextTryAt ? ` · next try ${dates.dateTime(m.nextTryAt)}` : ''}
        </Text>
        {m.lastError && m.status !== 'sent' && (
          <Alert color={m.status === 'failed' ? 'red' : 'yellow'} variant="light" icon={<IconAlertTriangle />} p="xs">
            {m.status === 'failed' ? 'Stopped trying: ' : 'Last attempt failed: '}
            {m.lastError}
          </Alert>
        )}
        {m.canResend && canResend && (
          <Button size="lg" leftSection={<IconRefresh />} loading={resend.isPending} onClick={() => resend.mutate(m.id)} style={{ alignSelf: 'flex-start' }}>
            Send again
          </Button>
        )}
        {error && (
          <Text c="red" size="sm" role="alert">
            {error}
          </Text>
        )}
      </Stack>
    </Card>
  );
}

/** Every e-mail of the job and where it is: waiting, sending, delivered to the mail server, or not delivered. */
export function MessagesPanel({ jobId, canResend }: { jobId: number; canResend: boolean }) {
  const messages = useMessages(jobId);
  if (!messages.data) return <QueryState isLoading={messages.isLoading} error={messages.error} />;
  return (
    <Stack gap="sm">
      <Title order={3}>E-mails to the owner</Title>
      {messages.data.length === 0 && <Text c="dimmed">No e-mails sent for this job yet.</Text>}
      {messages.data.map((m) => (
        <MessageCard key={m.id} m={m} canResend={canResend} jobId={jobId} />
      ))}
    </Stack>
  );
}

/** A banner for the top of the job page when an e-mail finally failed, so nobody misses it. */
export function FailedMessagesNotice({ jobId, onOpen }: { jobId: number; onOpen: () => void }) {
  const messages = useMessages(jobId);
  const failed = messages.data?.filter((m) => m.status === 'failed') ?? [];
  if (!failed.length) return null;
  return (
    <Alert color="red" variant="light" icon={<IconAlertTriangle />} mb="md" title="An e-mail to the owner was not delivered" role="alert">
      <Stack gap="xs">
        <Text size="sm">
          {failed.map((m) => `${KIND_LABELS[m.kind] ?? m.kind} to ${m.to}`).join('; ')}: {failed[0]?.lastError}
        </Text>
        <Button size="lg" variant="white" color="red" onClick={onOpen} style={{ alignSelf: 'flex-start' }}>
          See e-mails
        </Button>
      </Stack>
    </Alert>
  );
}
