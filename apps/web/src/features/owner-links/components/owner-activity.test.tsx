import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { OwnerActivity } from './owner-activity';

const decided = (id: number, details: Record<string, unknown>) => ({
  id,
  action: 'recommendation.decided',
  at: '2026-01-01T10:00:00.000Z',
  details: { recommendationId: 2, status: 'approved', channel: 'owner_link', decidedByName: 'Ada Owner', ...details },
});

describe('owner activity', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('names the item the owner answered, and falls back to its number for older entries', async () => {
    const body = [decided(1, { summary: 'Chain replacement' }), decided(2, {})];
    vi.stubGlobal('fetch', () => Promise.resolve(new Response(JSON.stringify(body), { status: 200, headers: { 'content-type': 'application/json' } })));
    render(
      <MantineProvider theme={theme}>
        <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
          <OwnerActivity jobId={7} />
        </QueryClientProvider>
      </MantineProvider>,
    );
    const items = await screen.findAllByTestId('owner-activity-item');
    expect(items[0]?.textContent).toContain('Ada Owner approved Chain replacement (owner link)');
    expect(items[1]?.textContent).toContain('Ada Owner approved item #2 (owner link)');
  });
});
