import { SHOWCASE_BACKGROUND_FROM, type ShowcaseExportTaskDto } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { ZipBar, zipRequest } from './zip-bar';

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
const task = (patch: Partial<ShowcaseExportTaskDto>): ShowcaseExportTaskDto => ({
  key: '7-abc',
  state: 'queued',
  progress: 0,
  code: null,
  error: null,
  ...patch,
});

function renderBar(pairIds: number[]) {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <QueryClientProvider client={qc}>
      <MantineProvider theme={theme}>
        <ZipBar pairIds={pairIds} />
      </MantineProvider>
    </QueryClientProvider>,
  );
}

/** Picks an option of a Mantine Select by its label. */
function choose(label: string, option: string) {
  fireEvent.click(screen.getByLabelText(label, { selector: 'input' }));
  fireEvent.click(screen.getByRole('option', { name: option }));
}

describe('showcase zip of a selection', () => {
  const fetchSpy = vi.fn<typeof fetch>();
  // Mantine's option list scrolls the active option into view; jsdom has no layout to scroll.
  beforeAll(() => {
    Element.prototype.scrollIntoView = () => undefined;
  });
  beforeEach(() => {
    fetchSpy.mockReset();
    vi.stubGlobal('fetch', fetchSpy);
  });
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it('asks for the composed pair of every selected item, in one size or all three', () => {
    expect(zipRequest([4, 9], 'banner').items).toEqual([
      { pairId: 4, variant: 'pair', size: 'banner' },
      { pairId: 9, variant: 'pair', size: 'banner' },
    ]);
    expect(zipRequest([4, 9], 'all').items.map((i) => `${i.pairId}:${i.size}`)).toEqual([
      '4:square',
      '4:portrait',
      '4:banner',
      '9:square',
      '9:portrait',
      '9:banner',
    ]);
  });

  it(`from ${SHOWCASE_BACKGROUND_FROM} files on, runs in the background: progress, then the download button`, { timeout: 10_000 }, async () => {
    fetchSpy
      .mockResolvedValueOnce(json(201, task({})))
      .mockResolvedValueOnce(json(200, task({ state: 'running', progress: 1 / 3 })))
      .mockResolvedValue(json(200, task({ state: 'done', progress: 1 })));
    renderBar([1, 2, 3]);
    choose('Zip size', 'All three sizes');
    fireEvent.click(screen.getByRole('button', { name: 'Zip 9 files' }));
    await screen.findByText('Making the zip: 3 of 9 files', undefined, { timeout: 4000 });
    expect(Number(screen.getByRole('progressbar', { name: 'Zip progress' }).getAttribute('aria-valuenow'))).toBeCloseTo(33.3, 1);
    await screen.findByRole('button', { name: 'Download zip' }, { timeout: 4000 });
    expect(screen.getByText('Your zip of 9 files is ready.')).toBeTruthy();
    const [url, init] = fetchSpy.mock.calls[0];
    expect([url, init?.method]).toEqual(['/api/showcase/exports', 'POST']);
    expect((JSON.parse(init?.body as string) as { items: unknown[] }).items).toHaveLength(9);
    expect(fetchSpy.mock.calls.slice(1).every(([u]) => u === '/api/showcase/exports/7-abc')).toBe(true);
  });

  it('says why a background export stopped, by its code (consent withdrawn mid-way)', { timeout: 10_000 }, async () => {
    const message = 'The owner withdrew consent for this job. Its photos can no longer be exported; take down any you published.';
    fetchSpy
      .mockResolvedValueOnce(json(201, task({ state: 'running', progress: 0.1 })))
      .mockResolvedValue(json(200, task({ state: 'failed', code: 'CONSENT_REVOKED', error: message })));
    renderBar([1, 2, 3]);
    choose('Zip size', 'All three sizes');
    fireEvent.click(screen.getByRole('button', { name: 'Zip 9 files' }));
    const alert = await screen.findByRole('alert', undefined, { timeout: 4000 });
    expect(within(alert).getByText('An owner withdrew consent')).toBeTruthy();
    expect(within(alert).getByText(message)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Download zip' })).toBeNull();
  });

  it('streams a small selection straight down, with no background task', async () => {
    // jsdom has no object URLs: the download hands the blob over through one.
    const createObjectURL = vi.fn(() => 'blob:zip');
    Object.assign(URL, { createObjectURL, revokeObjectURL: vi.fn() });
    fetchSpy.mockResolvedValue(new Response('PK', { status: 200, headers: { 'content-disposition': 'attachment; filename="showcase.zip"' } }));
    renderBar([5, 6]);
    fireEvent.click(screen.getByRole('button', { name: 'Zip 2 files' }));
    await waitFor(() => expect(createObjectURL).toHaveBeenCalled());
    expect(fetchSpy.mock.calls.map(([u]) => u)).toEqual(['/api/showcase/zip']);
    expect(screen.queryByRole('progressbar')).toBeNull();
  });

  it('a refused zip shows the code’s heading and message', async () => {
    fetchSpy.mockResolvedValue(json(403, { code: 'SHOWCASE_DESK_OFF', message: 'This shop has not opened the showcase to the front desk.', details: null }));
    renderBar([5]);
    fireEvent.click(screen.getByRole('button', { name: 'Zip 1 file' }));
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The showcase is closed to the desk')).toBeTruthy();
  });
});
