import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';
import { demoJobId } from './support/media';

interface Asset {
  id: number;
  kind: string;
  mime: string;
  urls: { poster: string | null; thumb: string | null };
}

/** Records a short WebM clip from Chromium's fake camera in the page, as a phone would film one. */
async function recordClip(page: Page, ms: number): Promise<Buffer> {
  const base64 = await page.evaluate(async (duration) => {
    const stream = await navigator.mediaDevices.getUserMedia({ video: { width: 640, height: 480 } });
    const recorder = new MediaRecorder(stream, { mimeType: 'video/webm' });
    const chunks: Blob[] = [];
    recorder.ondataavailable = (e) => chunks.push(e.data);
    const stopped = new Promise((resolve) => (recorder.onstop = resolve));
    recorder.start();
    await new Promise((r) => setTimeout(r, duration));
    recorder.stop();
    await stopped;
    stream.getTracks().forEach((t) => t.stop());
    const bytes = new Uint8Array(await new Blob(chunks, { type: 'video/webm' }).arrayBuffer());
    let binary = '';
    bytes.forEach((b) => (binary += String.fromCharCode(b)));
    return btoa(binary);
  }, ms);
  return Buffer.from(base64, 'base64');
}

async function videosOf(page: Page, jobId: number): Promise<Asset[]> {
  const res = await page.request.get(`/api/jobs/${jobId}/media`);
  return ((await res.json()) as Asset[]).filter((a) => a.mime.startsWith('video/'));
}

describe('video from a phone', () => {
  let b: Browser;
  let dir: string;
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'benchproof-video-e2e-'));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  afterEach(() => b?.close());

  it('sends a clip over the resumable route and gets a poster frame drawn from it', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, 'tobin@lantern-spoke.test');
    const jobId = await demoJobId(b.page);
    const before = (await videosOf(b.page, jobId)).length;
    await b.page.goto(`/jobs/${jobId}/capture`);
    await b.page.getByRole('button', { name: 'Take shots' }).waitFor();

    const clip = join(dir, 'stand-clip.webm');
    writeFileSync(clip, await recordClip(b.page, 1500));
    await b.page.getByTestId('camera-input').setInputFiles([clip]);
    await b.page.getByText('1 of 1 stored').waitFor({ timeout: 30_000 });

    // The server has no video decoder: the poster arrives from the browser after the upload.
    let video: Asset | undefined;
    await expect
      .poll(
        async () => {
          const videos = await videosOf(b.page, jobId);
          video = videos.find((v) => v.urls.poster);
          return { count: videos.length, poster: Boolean(video) };
        },
        { timeout: 30_000, interval: 500 },
      )
      .toEqual({ count: before + 1, poster: true });
    expect(video).toMatchObject({ kind: 'video', mime: 'video/webm' });
    const poster = await b.page.request.get(video!.urls.poster!);
    expect(poster.headers()['content-type']).toBe('image/jpeg');
    await shot(b.page, 'capture-video-phone');
  });
});
