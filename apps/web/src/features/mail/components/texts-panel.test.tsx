import type { TextMessageDto } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { textKeys } from '../api/texts';
import { MemoryRouter } from 'react-router';
import { CustomerTextsPanel, TextsPanel } from './texts-panel';

function text(id: number, patch: Partial<TextMessageDto>): TextMessageDto {
  return {
    ...{ id, jobId: 1, customerId: 4, kind: 'owner_link', to: '+61491570156', status: 'delivered', attempts: 1, maxAttempts: 6, lastError: null },
    body: `Shop ${id}: your bike's service page: [link removed after sending]`,
    ...{ nextTryAt: null, sentAt: '2026-03-02T10:05:00.000Z', statusAt: '2026-03-02T10:05:02.000Z', createdAt: '2026-03-02T10:04:00.000Z' },
    ...patch,
  };
}

function renderPanel(list: TextMessageDto[]) {
  const qc = new QueryClient({ defaultOptions: { queries: { staleTime: Infinity, retry: false } } });
  qc.setQueryData(textKeys.texts(1), list);
  return render(
    <QueryClientProvider client={qc}>
      <MantineProvider theme={theme}>
        <TextsPanel jobId={1} />
      </MantineProvider>
    </QueryClientProvider>,
  );
}

const card = (id: number) => screen.getByText(new RegExp(`Shop ${id}:`)).closest('.mantine-Card-root') as HTMLElement;

describe('job texts panel', () => {
  it('shows each text with its delivery in words, the attempts and why it stopped', () => {
    renderPanel([
      text(1, {}),
      text(2, { kind: 'ready_to_collect', status: 'failed', lastError: 'Attempt to send to unsubscribed recipient', sentAt: null }),
      text(3, { status: 'queued', attempts: 2, lastError: 'Service Unavailable', sentAt: null, nextTryAt: '2026-03-02T10:09:00.000Z' }),
      text(4, { status: 'opted_out', attempts: 0 }),
    ]);
    expect(within(card(1)).getByText('Delivered to the phone')).toBeTruthy();
    expect(within(card(1)).getByText('Owner link')).toBeTruthy();
    expect(within(card(2)).getByText('Not sent')).toBeTruthy();
    expect(within(card(2)).getByText('Ready to collect')).toBeTruthy();
    expect(within(card(2)).getByText(/Stopped trying: Attempt to send to unsubscribed recipient/)).toBeTruthy();
    expect(within(card(3)).getByText('Waiting to send')).toBeTruthy();
    expect(within(card(3)).getByText(/Last attempt failed: Service Unavailable/)).toBeTruthy();
    expect(within(card(3)).getByText(/attempt 2 of 6 · next try/)).toBeTruthy();
    expect(within(card(4)).getByText('Owner replied STOP')).toBeTruthy();
  });

  it('says when the job has no texts', () => {
    renderPanel([]);
    expect(screen.getByText(/No texts for this job/)).toBeTruthy();
  });
});

describe('customer texts panel', () => {
  it("lists the customer's texts across jobs, the STOP one named as such, each with a way to its job", () => {
    const qc = new QueryClient({ defaultOptions: { queries: { staleTime: Infinity, retry: false } } });
    qc.setQueryData(textKeys.customer(4), [text(7, { jobId: 12, status: 'opted_out', attempts: 0 }), text(8, { jobId: 11 })]);
    render(
      <QueryClientProvider client={qc}>
        <MantineProvider theme={theme}>
          <MemoryRouter>
            <CustomerTextsPanel customerId={4} />
          </MemoryRouter>
        </MantineProvider>
      </QueryClientProvider>,
    );
    expect(within(card(7)).getByText('Owner replied STOP')).toBeTruthy();
    expect(within(card(7)).getByRole('link', { name: '(open the job)' }).getAttribute('href')).toBe('/jobs/12');
    expect(within(card(8)).getByRole('link', { name: '(open the job)' }).getAttribute('href')).toBe('/jobs/11');
  });
});
