import type { JobDetail } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { JobActions } from './job-actions';

type Sent = { to: string; confirmNoReport?: boolean; unpaidReason?: string };

/** The API as the hand-over rules answer: no report sent yet, then money still due, then done. */
function handOverApi(): Sent[] {
  const sent: Sent[] = [];
  const answer = (status: number, body: unknown) =>
    Promise.resolve(new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } }));
  vi.stubGlobal('fetch', (_url: string, init: RequestInit) => {
    if (init.method !== 'POST') return answer(200, {});
    const body = JSON.parse(init.body as string) as Sent;
    sent.push(body);
    if (!body.confirmNoReport) return answer(409, { code: 'REPORT_NOT_SENT', message: 'No report', details: null });
    if (!body.unpaidReason) return answer(409, { code: 'UNPAID_BALANCE', message: 'Money due', details: { dueMinor: 4200 } });
    return answer(200, { id: 7, status: 'collected' });
  });
  return sent;
}

describe('handing a bike over with money still due', () => {
  afterEach(cleanup);
  it('asks desk why, refuses an empty reason, and sends the reason together with the earlier "no report" confirmation', { timeout: 20_000 }, async () => {
    const sent = handOverApi();
    const job = { id: 7, status: 'ready', nextAction: { to: 'collected', label: 'Hand back' }, allowedTransitions: [] } as unknown as JobDetail;
    render(
      <MantineProvider theme={theme}>
        <QueryClientProvider client={new QueryClient()}>
          <JobActions job={job} />
        </QueryClientProvider>
      </MantineProvider>,
    );
    fireEvent.click(screen.getByRole('button', { name: 'Hand back' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Hand over without a report' }, { timeout: 5000 }));
    const unpaid = await screen.findByRole('button', { name: 'Hand over unpaid' }, { timeout: 5000 });
    expect(screen.queryByRole('alert')).toBeNull(); // a dialog, not an error line
    fireEvent.click(unpaid);
    expect(await screen.findByText('Say why the bike goes home unpaid.')).toBeTruthy();
    expect(sent).toHaveLength(2);
    fireEvent.change(screen.getByLabelText('Why is it going home unpaid?'), { target: { value: 'Pays by bank transfer on Friday' } });
    fireEvent.click(screen.getByRole('button', { name: 'Hand over unpaid' }));
    await waitFor(() => expect(sent).toHaveLength(3));
    expect(sent[2]).toMatchObject({ to: 'collected', confirmNoReport: true, unpaidReason: 'Pays by bank transfer on Friday' });
  });
});
