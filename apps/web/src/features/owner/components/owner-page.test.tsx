import type { OwnerPageDto } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { OwnerPage } from './owner-page';

const totals = { partsMinor: 3500, labourMinor: 1500, netMinor: 5000, taxMinor: 1000, grossMinor: 6000 };

const earlierApproved: OwnerPageDto['findings'][number] = {
  id: 2,
  area: 'brakes',
  condition: 'worn',
  description: 'Pads thin',
  doNotRide: false,
  cautions: [],
  shots: [],
  recommendation: {
    id: 12,
    summary: 'New brake pads',
    urgency: 'soon',
    currency: 'GBP',
    totals: { ...totals, grossMinor: 2500 },
    decisionStatus: 'approved',
    updatedAt: '2026-01-01T00:00:00.000Z',
  },
};

function page(status: string, extra: OwnerPageDto['findings'] = []): OwnerPageDto {
  return {
    shop: { name: 'Test Cycles', phone: '0100 000000', email: 'shop@example.test', brandPrimary: '#224466', brandAccent: '#cc8833', dateLocale: 'en-GB' },
    job: { number: 'J-0001', status, reportedSymptoms: 'Chain skips', promisedOn: null },
    bike: { maker: 'Testwerk', model: 'Bench One', year: 2020, colour: null },
    ownerName: 'Ada Owner',
    expiresAt: '2030-01-01T00:00:00.000Z',
    findings: [
      {
        id: 1,
        area: 'drivetrain',
        condition: 'worn',
        description: 'Chain stretched',
        doNotRide: false,
        cautions: [],
        shots: [],
        recommendation: {
          id: 11,
          summary: 'New chain',
          urgency: 'soon',
          currency: 'GBP',
          totals,
          decisionStatus: 'pending',
          updatedAt: '2026-01-01T00:00:00.000Z',
        },
      },
      ...extra,
    ],
    measurements: [],
    pairs: [],
    report: null,
    consent: null,
  };
}

function show(status: string, extra: OwnerPageDto['findings'] = []) {
  vi.stubGlobal('fetch', () =>
    Promise.resolve(new Response(JSON.stringify(page(status, extra)), { status: 200, headers: { 'content-type': 'application/json' } })),
  );
  vi.stubGlobal(
    'IntersectionObserver',
    class {
      observe() {}
      disconnect() {}
    },
  );
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <MantineProvider theme={theme}>
      <QueryClientProvider client={client}>
        <OwnerPage token="t0k3n" />
      </QueryClientProvider>
    </MantineProvider>,
  );
}

describe('owner page of a closed job', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('says the job is closed and offers no answers on a collected job', { timeout: 30_000 }, async () => {
    show('collected');
    expect(await screen.findByText('This job is closed', undefined, { timeout: 15_000 })).toBeTruthy();
    expect(screen.getByText(/Your bike has been handed back/)).toBeTruthy();
    expect(screen.getByText('Not answered')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Approve/ })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Confirm' })).toBeNull();
  });

  it('offers approve and decline while the job is open', { timeout: 30_000 }, async () => {
    show('waiting_owner');
    expect(await screen.findByRole('button', { name: /Approve/ }, { timeout: 15_000 })).toBeTruthy();
    expect(screen.queryByText('This job is closed')).toBeNull();
  });
});

describe('owner page answers and consent', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('counts an item approved on an earlier visit in the approved total', { timeout: 30_000 }, async () => {
    show('waiting_owner', [earlierApproved]);
    const total = await screen.findByTestId('running-total', undefined, { timeout: 15_000 });
    expect(total.textContent).toBe('Approved: £25.00');
    fireEvent.click(screen.getByRole('button', { name: /Approve/ }));
    expect(screen.getByTestId('running-total').textContent).toBe('Approved: £85.00');
  });

  it('holds the consent section’s place with a placeholder while it loads', { timeout: 30_000 }, async () => {
    show('waiting_owner');
    expect(await screen.findByTestId('consent-placeholder', undefined, { timeout: 15_000 })).toBeTruthy();
  });
});
