import { SHOWCASE_BACKGROUND_FROM, type ShowcaseExportTaskDto } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { ZipBar, zipRequest, type CardChoice } from './zip-bar';

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
const task = (patch: Partial<ShowcaseExportTaskDto>): ShowcaseExportTaskDto => ({
  key: '7-abc',
  state: 'queued',
  progress: 0,
  code: null,
  error: null,
  ...patch,
});

const pairs = (ids: number[]): CardChoice[] => ids.map((pairId) => ({ pairId, variant: 'pair', size: 'square' }));

function renderBar(choices: CardChoice[]) {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <QueryClientProvider client={qc}>
      <MantineProvider theme={theme}>
        <ZipBar choices={choices} />
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

  it('honours each card’s "What" and "Size", or makes each card’s choice in all three sizes', () => {
    const choices: CardChoice[] = [
      { pairId: 4, variant: 'after', size: 'banner' },
      { pairId: 9, variant: 'before', size: 'portrait' },
    ];
    expect(zipRequest(choices, 'card').items).toEqual([
      { pairId: 4, variant: 'after', size: 'banner' },
      { pairId: 9, variant: 'before', size: 'portrait' },
    ]);
    expect(zipRequest(choices, 'all').items.map((i) => `${i.pairId}:${i.variant}:${i.size}`)).toEqual([
      '4:after:square',
      '4:after:portrait',
      '4:after:banner',
      '9:before:square',
      '9:before:portrait',
      '9:before:banner',
    ]);
  });

  it('the zip sent carries each card’s choice, and the screen says so', async () => {
    Object.assign(URL, { createObjectURL: vi.fn(() => 'blob:zip'), revokeObjectURL: vi.fn() });
    fetchSpy.mockResolvedValue(new Response('PK', { status: 200 }));
    renderBar([
      { pairId: 5, variant: 'before', size: 'portrait' },
      { pairId: 6, variant: 'after', size: 'banner' },
    ]);
    expect(screen.getByLabelText<HTMLInputElement>('Files in the zip', { selector: 'input' }).value).toBe('As chosen on each card');
    fireEvent.click(screen.getByRole('button', { name: 'Zip 2 files' }));
    await waitFor(() => expect(fetchSpy).toHaveBeenCalled());
    expect((JSON.parse(fetchSpy.mock.calls[0][1]?.body as string) as { items: unknown[] }).items).toEqual([
      { pairId: 5, variant: 'before', size: 'portrait' },
      { pairId: 6, variant: 'after', size: 'banner' },
    ]);
  });

  it(`from ${SHOWCASE_BACKGROUND_FROM} files on, runs in the background: progress, then the download button`, { timeout: 10_000 }, async () => {
    fetchSpy
      .mockResolvedValueOnce(json(201, task({})))
      .mockResolvedValueOnce(json(200, task({ state: 'running', progress: 1 / 3 })))
      .mockResolvedValue(json(200, task({ state: 'done', progress: 1 })));
    renderBar(pairs([1, 2, 3]));
    choose('Files in the zip', 'Each card’s choice, all three sizes');
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
    renderBar(pairs([1, 2, 3]));
    choose('Files in the zip', 'Each card’s choice, all three sizes');
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
    renderBar(pairs([5, 6]));
    fireEvent.click(screen.getByRole('button', { name: 'Zip 2 files' }));
    await waitFor(() => expect(createObjectURL).toHaveBeenCalled());
    expect(fetchSpy.mock.calls.map(([u]) => u)).toEqual(['/api/showcase/zip']);
    expect(screen.queryByRole('progressbar')).toBeNull();
  });

  it('a refused zip shows the code’s heading and message', async () => {
    fetchSpy.mockResolvedValue(json(403, { code: 'SHOWCASE_DESK_OFF', message: 'This shop has not opened the showcase to the front desk.', details: null }));
    renderBar(pairs([5]));
    fireEvent.click(screen.getByRole('button', { name: 'Zip 1 file' }));
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The showcase is closed to the desk')).toBeTruthy();
  });
});
