import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { CDPSession, Page } from 'playwright-core';
import { openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';
import { bookInJob, makeShots } from './support/media';

const MECHANIC = 'tobin@lantern-spoke.test';
const OTHER_MECHANIC = 'ines@lantern-spoke.test';
let dir: string;
let files: string[];
const sha = (path: string) => createHash('sha256').update(readFileSync(path)).digest('hex');

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'benchproof-offline-e2e-'));
  files = await makeShots(dir, 3);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Chromium's own network emulation through the DevTools protocol: offline fires the page's offline event. */
async function network(cdp: CDPSession, offline: boolean) {
  await cdp.send('Network.emulateNetworkConditions', { offline, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
}

/**
 * Uploads (POST …/media) fail as if the Wi-Fi dropped, while the page itself and every other call still load: the
 * only way to reload the page with shots waiting before the app is installed with its service worker.
 */
async function devtools(page: Page) {
  const cdp = await page.context().newCDPSession(page);
  cdp.on('Fetch.requestPaused', (e: { requestId: string; request: { method: string } }) => {
    const send =
      e.request.method === 'POST'
        ? cdp.send('Fetch.failRequest', { requestId: e.requestId, errorReason: 'InternetDisconnected' })
        : cdp.send('Fetch.continueRequest', { requestId: e.requestId });
    void send.catch(() => undefined);
  });
  return {
    cdp,
    cutUploads: () => cdp.send('Fetch.enable', { patterns: [{ urlPattern: '*/api/jobs/*/media' }] }),
    restoreUploads: () => cdp.send('Fetch.disable'),
  };
}

interface Asset {
  id: number;
  area: string;
  caption: string;
  sha256: string;
}
const assetsOf = async (page: Page, jobId: number) =>
  ((await (await page.request.get(`/api/jobs/${jobId}/media`)).json()) as Asset[]).sort((a, b) => a.id - b.id);

async function takeShots(page: Page, paths: string[]) {
  await page.getByRole('radiogroup', { name: 'Area for new and selected shots' }).getByText('Brakes', { exact: true }).click();
  await page.getByTestId('camera-input').setInputFiles(paths);
  await page
    .getByTestId('shot-card')
    .nth(paths.length - 1)
    .waitFor();
}

describe('capture that survives the Wi-Fi (phone)', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('three shots taken offline survive a reload and upload once, in order, with their tags, when the connection returns', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, MECHANIC);
    const jobId = await bookInJob();
    await b.page.goto(`/jobs/${jobId}/capture`);
    await b.page.getByRole('button', { name: 'Take shots' }).waitFor();
    const { cdp, cutUploads, restoreUploads } = await devtools(b.page);
    await network(cdp, true);
    await b.page.getByTestId('offline-notice').waitFor();

    await takeShots(b.page, files);
    const third = b.page.getByTestId('shot-card').nth(2);
    await third.getByRole('button', { name: 'Tag this shot' }).click();
    await third.getByLabel('Caption (optional)').fill('Pad wear, rear caliper');
    await third.getByRole('button', { name: 'Done tagging' }).click();
    await b.page.locator('[data-testid="upload-badge"][data-online="false"][data-waiting="3"]').waitFor();
    expect(await b.page.locator('[data-testid="shot-card"][data-status="queued"]').count()).toBe(3);
    await b.page.waitForTimeout(300); // thumbnails decode
    await shot(b.page, 'capture-offline-phone');

    // Still no way through for uploads, but the page can load again: reload, the shots come back from IndexedDB.
    await cutUploads();
    await network(cdp, false);
    await b.page.reload();
    await b.page.getByTestId('shot-card').nth(2).waitFor();
    expect(await b.page.getByTestId('shot-card').count()).toBe(3);
    await b.page.getByText('Brakes · Pad wear, rear caliper').waitFor();
    await b.page.locator('[data-testid="upload-badge"][data-waiting="3"]').waitFor();
    expect(await assetsOf(b.page, jobId)).toEqual([]);
    await shot(b.page, 'capture-reloaded-waiting-phone');

    // The connection returns (the page sees offline, then online): every shot goes, once.
    await restoreUploads();
    await network(cdp, true);
    await network(cdp, false);
    await b.page.getByText('3 of 3 stored').waitFor({ timeout: 30_000 });
    await b.page.locator('[data-testid="upload-badge"]').waitFor({ state: 'detached' });
    const assets = await assetsOf(b.page, jobId);
    expect(assets.map((a) => [a.sha256, a.area, a.caption])).toEqual([
      [sha(files[0]), 'brakes', ''],
      [sha(files[1]), 'brakes', ''],
      [sha(files[2]), 'brakes', 'Pad wear, rear caliper'],
    ]);

    // Nothing is left to send after another reload: none doubled.
    await b.page.reload();
    await b.page.getByRole('button', { name: 'Take shots' }).waitFor();
    await b.page.waitForTimeout(1500);
    expect(await b.page.getByTestId('shot-card').count()).toBe(0);
    expect((await assetsOf(b.page, jobId)).length).toBe(3);
  }, 120_000); // a long flow on a shared, loaded machine: two reloads and three uploads

  it('sign-out with shots waiting: kept for the same user, never shown to another; "delete" removes them', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, MECHANIC);
    const jobId = await bookInJob();
    await b.page.goto(`/jobs/${jobId}/capture`);
    const { cutUploads, restoreUploads } = await devtools(b.page);
    await cutUploads();
    await takeShots(b.page, files.slice(0, 2));
    await b.page.locator('[data-testid="upload-badge"][data-waiting="2"]').waitFor();

    await b.page.getByRole('button', { name: 'Sign out' }).click();
    await b.page.getByRole('button', { name: 'Keep for my next sign-in' }).waitFor();
    await shot(b.page, 'sign-out-shots-waiting-phone');
    await b.page.getByRole('button', { name: 'Keep for my next sign-in' }).click();
    await b.page.waitForURL((u) => u.pathname.startsWith('/sign-in'));

    await signIn(b.page, OTHER_MECHANIC);
    await b.page.goto(`/jobs/${jobId}/capture`);
    await b.page.getByText('No shots yet').waitFor();
    expect(await b.page.getByTestId('shot-card').count()).toBe(0);
    expect(await b.page.getByTestId('upload-badge').count()).toBe(0);

    // Uploads can go again; the first mechanic signs back in and their two shots carry on.
    await restoreUploads();
    await b.page.getByRole('button', { name: 'Sign out' }).click();
    await b.page.waitForURL((u) => u.pathname.startsWith('/sign-in'));
    await signIn(b.page, MECHANIC);
    await b.page.goto(`/jobs/${jobId}/capture`);
    await b.page.getByText('2 of 2 stored').waitFor({ timeout: 30_000 });
    expect((await assetsOf(b.page, jobId)).map((a) => a.sha256)).toEqual([sha(files[0]), sha(files[1])]);

    // "Delete": the waiting shot is gone for this user too.
    await cutUploads();
    await takeShots(b.page, files.slice(2));
    await b.page.locator('[data-testid="upload-badge"][data-waiting="1"]').waitFor();
    await b.page.getByRole('button', { name: 'Sign out' }).click();
    await b.page.getByRole('button', { name: 'Delete the waiting shots' }).click();
    await b.page.waitForURL((u) => u.pathname.startsWith('/sign-in'));
    await restoreUploads();
    await signIn(b.page, MECHANIC);
    await b.page.goto(`/jobs/${jobId}/capture`);
    await b.page.getByText('No shots yet').waitFor();
    await b.page.waitForTimeout(1000);
    expect((await assetsOf(b.page, jobId)).length).toBe(2);
  }, 120_000); // four sign-ins and two upload rounds
});
