import type { ShowcaseItemDto } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { CaptionEditor } from './caption-editor';

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

const item = {
  pairId: 12,
  jobId: 3,
  area: 'drivetrain',
  caption: 'Before and after: drivetrain.',
  consent: { grantedAt: '2026-03-02T10:00:00.000Z', nameMakeModel: false, wordingVersion: 'marketing-photos-v1', method: 'owner_link' },
} as ShowcaseItemDto;

function renderEditor(onClose = vi.fn()) {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <QueryClientProvider client={qc}>
      <MantineProvider theme={theme}>
        <CaptionEditor item={item} opened onClose={onClose} />
      </MantineProvider>
    </QueryClientProvider>,
  );
  return onClose;
}

/** The message Mantine shows under the caption box (the `…-error` element the box names in aria-describedby). */
function messageUnderCaption(): string | null {
  const box = screen.getByLabelText('Caption for this pair');
  const ids = (box.getAttribute('aria-describedby') ?? '').split(' ').filter((id) => id.endsWith('-error'));
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').find((t) => t.length > 0) ?? null;
}

function typeAndSave(text: string) {
  fireEvent.change(screen.getByLabelText('Caption for this pair'), { target: { value: text } });
  fireEvent.click(screen.getByRole('button', { name: 'Save caption' }));
}

describe('showcase caption editor: errors by code, under the caption box', () => {
  const fetchSpy = vi.fn<typeof fetch>();
  // Mantine's autosize textarea listens for web fonts loading; jsdom has no document.fonts.
  beforeAll(() => {
    Object.defineProperty(document, 'fonts', { configurable: true, value: { addEventListener: () => undefined, removeEventListener: () => undefined } });
  });
  beforeEach(() => {
    fetchSpy.mockReset();
    vi.stubGlobal('fetch', fetchSpy);
  });
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it('NO_CONSENT for naming the bike: the field message and what to do, the text kept, the editor open', async () => {
    const message = 'The owner did not allow naming the bike’s make or model.';
    fetchSpy.mockResolvedValue(json(409, { code: 'NO_CONSENT', message, details: { issues: [{ path: 'caption', message }] } }));
    const onClose = renderEditor();
    typeAndSave('A Testwerk Bench One, fresh');
    await waitFor(() => expect(messageUnderCaption()).toBe(`${message} Take the make and model out, or use “Draft from the job”.`));
    expect(screen.getByLabelText<HTMLTextAreaElement>('Caption for this pair').value).toBe('A Testwerk Bench One, fresh');
    expect(onClose).not.toHaveBeenCalled();
    const [url, init] = fetchSpy.mock.calls[0];
    expect([url, init?.method, init?.body]).toEqual(['/api/showcase/items/12', 'PATCH', JSON.stringify({ caption: 'A Testwerk Bench One, fresh' })]);
  });

  it('CONSENT_REVOKED: the server’s message and that the pair is leaving', async () => {
    const message = 'The owner withdrew consent for this job. Its photos can no longer be exported; take down any you published.';
    fetchSpy.mockResolvedValue(json(409, { code: 'CONSENT_REVOKED', message, details: { pairId: 12, jobId: 3 } }));
    renderEditor();
    typeAndSave('Fresh chain and cassette');
    await waitFor(() => expect(messageUnderCaption()).toBe(`${message} This pair is leaving the library.`));
  });

  it('VALIDATION_FAILED: the caption issue itself; no connection: the text is kept', async () => {
    fetchSpy.mockResolvedValueOnce(
      json(400, {
        code: 'VALIDATION_FAILED',
        message: 'Some fields need attention.',
        details: { issues: [{ path: 'caption', message: 'Keep the caption under 300 characters.' }] },
      }),
    );
    renderEditor();
    typeAndSave('x');
    await waitFor(() => expect(messageUnderCaption()).toBe('Keep the caption under 300 characters.'));
    fetchSpy.mockRejectedValueOnce(new TypeError('Failed to fetch'));
    fireEvent.click(screen.getByRole('button', { name: 'Save caption' }));
    await waitFor(() => expect(messageUnderCaption()).toBe('No connection to the workshop server. Your text is kept; try again.'));
  });

  it('saves and closes when the server accepts', async () => {
    fetchSpy.mockResolvedValue(json(200, { ...item, caption: 'Fresh chain' }));
    const onClose = renderEditor();
    typeAndSave('Fresh chain');
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(messageUnderCaption()).toBeNull();
  });
});
