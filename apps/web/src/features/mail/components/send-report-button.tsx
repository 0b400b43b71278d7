import type { OutboxMessageDto } from '@benchproof/contracts';
import { Button, Stack, Text } from '@mantine/core';
import { IconMail } from '@tabler/icons-react';
import { ApiError } from '../../../lib/api-client';
import { useMessages, useSendReport } from '../api/messages';
import { ConfirmStep } from '../../../components/confirm-step';

const sentBefore = (list: OutboxMessageDto[] | undefined, reportId: number) => list?.find((m) => m.kind === 'report_ready' && m.reportId === reportId);

function sendError(e: Error | null): string | null {
  if (e instanceof ApiError)
    return e.code === 'NO_OWNER_EMAIL' ? 'The owner has no e-mail address on file. Add one to the customer, or hand over a printed copy.' : e.message;
  return e ? 'Sending did not go through. Try again.' : null;
}

/** "Send to owner" for one issued version; says when it was already queued or sent so desk does not send it twice by accident. */
export function SendReportButton({ jobId, reportId }: { jobId: number; reportId: number }) {
  const send = useSendReport(jobId);
  const messages = useMessages(jobId);
  const earlier = sentBefore(messages.data, reportId);
  const error = sendError(send.error);
  return (
    <Stack gap={4} mt="xs">
      <ConfirmStep
        question={
          earlier
            ? 'E-mail this report to the owner again? An e-mail cannot be called back.'
            : 'E-mail this report to the owner now? An e-mail cannot be called back.'
        }
        confirmLabel="Send the e-mail"
        onConfirm={() => send.mutate(reportId)}
        trigger={(ask) => (
          <Button
            size="lg"
            variant={earlier ? 'light' : 'filled'}
            leftSection={<IconMail />}
            loading={send.isPending}
            onClick={ask}
            style={{ alignSelf: 'flex-start' }}
          >
            {earlier ? 'Send to owner again' : 'Send to owner'}
          </Button>
        )}
      />
      {send.isSuccess && (
        <Text size="sm" c="teal" role="status">
          Queued for {send.data.to}. Its progress shows under Messages.
        </Text>
      )}
      {!send.isSuccess && earlier && (
        <Text size="sm" c="dimmed">
          Already {earlier.status === 'sent' ? 'sent' : 'queued'} to {earlier.to}.
        </Text>
      )}
      {error && (
        <Text size="sm" c="red" role="alert">
          {error}
        </Text>
      )}
    </Stack>
  );
}
