import { createHash, randomBytes } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { CDPSession, Page } from 'playwright-core';
import { openBrowser, PHONE, signIn, type Browser } from './support/browser';
import { bookInJob } from './support/media';

const MECHANIC = 'tobin@lantern-spoke.test';
/** The web client's tus chunk (transports.ts): the server holds whole chunks once each PATCH is answered. */
const CHUNK = 4 * 1024 * 1024;
const sha = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

/**
 * A 16 MiB playable video: the API tests' 1 s H.264 clip followed by a `free` box of random bytes (ISO/IEC
 * 14496-12 §8.1.2: readers skip free space), so the server's video check still reads it.
 */
function largeClip(dir: string): { path: string; bytes: Buffer } {
  const clip = readFileSync(resolve(import.meta.dirname, '../../api/test/media/clip-64x48.mp4'));
  const padding = randomBytes(16 * 1024 * 1024 - clip.length - 8);
  const head = Buffer.alloc(8);
  head.writeUInt32BE(padding.length + 8, 0);
  head.write('free', 4, 'latin1');
  const bytes = Buffer.concat([clip, head, padding]);
  const path = join(dir, 'stand-long.mp4');
  writeFileSync(path, bytes);
  return { path, bytes };
}

/** The tus upload's address as tus-js-client remembers it in the page (by the shot's fingerprint). */
const rememberedUpload = (page: Page) =>
  page.evaluate(() => {
    const key = Object.keys(localStorage).find((k) => k.startsWith('tus::benchproof-shot-'));
    return key ? (JSON.parse(localStorage.getItem(key)!) as { uploadUrl: string | null }).uploadUrl : null;
  });

/** How many bytes the server holds for the upload (tus HEAD), asked outside the page's emulated network. */
async function serverOffset(page: Page, url: string): Promise<number> {
  const res = await page.request.head(url, { headers: { 'tus-resumable': '1.0.0' } });
  return Number(res.headers()['upload-offset'] ?? -1);
}

/**
 * The connection drops after the first chunk: the second PATCH fails as if the Wi-Fi went (DevTools Fetch domain),
 * and from then on the page is offline (Chromium's network emulation). Resolves once that happened.
 */
function cutAfterFirstChunk(cdp: CDPSession): Promise<void> {
  let patches = 0;
  return new Promise((cut) => {
    cdp.on('Fetch.requestPaused', (e: { requestId: string; request: { method: string } }) => {
      if (e.request.method !== 'PATCH' || ++patches === 1) return void cdp.send('Fetch.continueRequest', { requestId: e.requestId }).catch(() => undefined);
      void cdp
        .send('Network.emulateNetworkConditions', { offline: true, latency: 0, downloadThroughput: -1, uploadThroughput: -1 })
        .then(() => cdp.send('Fetch.failRequest', { requestId: e.requestId, errorReason: 'InternetDisconnected' }))
        .catch(() => undefined)
        .finally(cut);
    });
    void cdp.send('Fetch.enable', { patterns: [{ urlPattern: '*/api/media/tus*' }] });
  });
}

describe('a large video over a dropping connection (phone)', () => {
  let b: Browser;
  let dir: string;
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'benchproof-video-resume-e2e-'));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  afterEach(() => b?.close());

  it('cut midway, page closed, reopened: resumes at the server’s offset and the stored original has the same SHA-256', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, MECHANIC);
    const jobId = await bookInJob();
    const clip = largeClip(dir);
    await b.page.goto(`/jobs/${jobId}/capture`);
    await b.page.getByRole('button', { name: 'Take shots' }).waitFor();
    const cut = cutAfterFirstChunk(await b.context.newCDPSession(b.page));
    await b.page.getByTestId('camera-input').setInputFiles([clip.path]);
    await cut;
    const url = await rememberedUpload(b.page);
    expect(url).toMatch(/\/api\/media\/tus\//);
    expect(await serverOffset(b.page, url!)).toBe(CHUNK);
    await b.page.close();

    // Reopened with the connection back: the kept shot comes back from IndexedDB and carries on where the server is.
    const page = await b.context.newPage();
    const sent: { method: string; offset: number }[] = [];
    page.on('request', (r) => {
      if (!r.url().includes('/api/media/tus')) return;
      void r.allHeaders().then((h) => sent.push({ method: r.method(), offset: Number(h['upload-offset'] ?? -1) }));
    });
    await page.goto(`/jobs/${jobId}/capture`);
    await page.locator('[data-testid="shot-card"][data-status="done"]').waitFor({ timeout: 60_000 });
    expect(sent.filter((s) => s.method === 'POST')).toEqual([]); // no new upload was created
    expect(sent.find((s) => s.method === 'PATCH')?.offset).toBe(CHUNK);

    const videos = ((await (await page.request.get(`/api/jobs/${jobId}/media`)).json()) as { id: number; kind: string; sha256: string }[]).filter(
      (a) => a.kind === 'video',
    );
    expect(videos.map((v) => v.sha256)).toEqual([sha(clip.bytes)]);
    const original = Buffer.from(await (await page.request.get(`/api/media/${videos[0].id}/original`)).body());
    expect(original.length).toBe(clip.bytes.length);
    expect(sha(original)).toBe(sha(clip.bytes));
  }, 180_000); // 16 MiB kept in IndexedDB and sent twice over on a shared, loaded machine
});
