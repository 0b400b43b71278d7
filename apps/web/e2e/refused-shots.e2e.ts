import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';
import { bookInJob, makeImpostor, makeShots } from './support/media';

const MECHANIC = 'tobin@lantern-spoke.test';
let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'benchproof-refused-e2e-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('a shot the server refuses (phone)', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('stays in the queue with the server’s reason and a delete button after a reload, and is not sent again by itself', async () => {
    b = await openBrowser(PHONE);
    const { page } = b;
    await signIn(page, MECHANIC);
    const jobId = await bookInJob();
    const [photo] = await makeShots(dir, 1);
    let mediaPosts = 0;
    page.on('request', (r) => void (r.method() === 'POST' && r.url().endsWith(`/api/jobs/${jobId}/media`) && mediaPosts++));
    await page.goto(`/jobs/${jobId}/capture`);
    await page.getByTestId('camera-input').setInputFiles([makeImpostor(dir), photo]);

    const refused = page.locator('[data-testid="shot-card"][data-status="failed"]');
    await refused.getByRole('alert').waitFor({ timeout: 30_000 });
    await page.locator('[data-testid="shot-card"][data-status="done"]').waitFor({ timeout: 30_000 });
    const reason = (await refused.getByRole('alert').textContent()) ?? '';
    expect(reason.length).toBeGreaterThan(5);
    const postsBefore = mediaPosts;

    // A reload: the stored photo is gone from the list, the refused one is back with the same reason.
    await page.reload();
    await refused.getByRole('alert').waitFor();
    expect(await refused.getByRole('alert').textContent()).toBe(reason);
    expect(await page.getByTestId('shot-card').count()).toBe(1);
    await refused.getByRole('button', { name: 'Remove not-a-photo.jpg' }).waitFor();
    await refused.getByRole('button', { name: 'Retry not-a-photo.jpg' }).waitFor();
    await page.waitForTimeout(300); // the preview settles
    await shot(page, 'capture-refused-after-reload-phone');
    // Neither the reload nor the connection coming back sends it again.
    const cdp = await b.context.newCDPSession(page);
    for (const offline of [true, false]) {
      await cdp.send('Network.emulateNetworkConditions', { offline, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
    }
    await page.waitForTimeout(1500);
    expect(mediaPosts).toBe(postsBefore);
    expect(await refused.count()).toBe(1);

    // Delete: gone, and still gone after another reload.
    await refused.getByRole('button', { name: 'Remove not-a-photo.jpg' }).click();
    await page.getByTestId('shot-card').waitFor({ state: 'detached' });
    await page.reload();
    await page.getByRole('button', { name: 'Take shots' }).waitFor();
    await page.waitForTimeout(1000);
    expect(await page.getByTestId('shot-card').count()).toBe(0);
  }, 120_000); // three page loads and two uploads on a shared, loaded machine
});
