import type { OutboxMessageDto } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { mailKeys } from '../api/messages';
import { MessagesPanel } from './messages-panel';

function message(id: number, patch: Partial<OutboxMessageDto>): OutboxMessageDto {
  return {
    id,
    jobId: 1,
    kind: 'report_ready',
    reportId: 3,
    to: 'owner@example.test',
    subject: `Your bench report ${id}`,
    status: 'sent',
    attempts: 1,
    maxAttempts: 8,
    lastError: null,
    nextTryAt: null,
    sentAt: '2026-03-02T10:05:00.000Z',
    createdAt: '2026-03-02T10:04:00.000Z',
    messageId: `<m${id}@x.test>`,
    attachments: [{ filename: 'bench-report-3.pdf', size: 120_000 }],
    canResend: false,
    ...patch,
  };
}

function renderPanel(list: OutboxMessageDto[], canResend = true) {
  const qc = new QueryClient({ defaultOptions: { queries: { staleTime: Infinity, retry: false } } });
  qc.setQueryData(mailKeys.messages(1), list);
  return render(
    <QueryClientProvider client={qc}>
      <MantineProvider theme={theme}>
        <MessagesPanel jobId={1} canResend={canResend} />
      </MantineProvider>
    </QueryClientProvider>,
  );
}

const card = (subject: string) => screen.getByText(new RegExp(subject)).closest('.mantine-Card-root') as HTMLElement;

describe('job e-mails panel', () => {
  it('shows each message with its status in words, attempts and the reason it stopped, and resend only on the failed one', () => {
    renderPanel([
      message(1, {}),
      message(2, { status: 'failed', attempts: 8, lastError: 'connect ECONNREFUSED 127.0.0.1:1025', sentAt: null, canResend: true }),
      message(3, { status: 'queued', attempts: 2, lastError: 'Greeting never received', sentAt: null, nextTryAt: '2026-03-02T10:09:00.000Z' }),
    ]);
    expect(within(card('Your bench report 1')).getByText('Delivered to mail server')).toBeTruthy();
    expect(within(card('Your bench report 1')).queryByRole('button', { name: 'Send again' })).toBeNull();
    const failed = card('Your bench report 2');
    expect(within(failed).getByText('Not delivered')).toBeTruthy();
    expect(within(failed).getByText(/Stopped trying: connect ECONNREFUSED/)).toBeTruthy();
    expect(within(failed).getByText(/attempt 8 of 8/)).toBeTruthy();
    expect(within(failed).getByRole('button', { name: 'Send again' })).toBeTruthy();
    const waiting = card('Your bench report 3');
    expect(within(waiting).getByText('Waiting to send')).toBeTruthy();
    expect(within(waiting).getByText(/Last attempt failed: Greeting never received/)).toBeTruthy();
    expect(within(waiting).getByText(/next try/)).toBeTruthy();
  });

  it('hides resend from a role that may not send', () => {
    renderPanel([message(2, { status: 'failed', lastError: 'refused', canResend: true })], false);
    expect(screen.queryByRole('button', { name: 'Send again' })).toBeNull();
  });

  it('says so when no e-mail has been sent', () => {
    renderPanel([]);
    expect(screen.getByText('No e-mails sent for this job yet.')).toBeTruthy();
  });
});
