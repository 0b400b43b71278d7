import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { DESKTOP, openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';
import { demoJobId, imageSize, makeImpostor, makeShots } from './support/media';

const MECHANIC = 'tobin@lantern-spoke.test';
let dir: string;
let files: string[];

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'benchproof-media-e2e-'));
  files = await makeShots(dir, 3, true);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function swipe(page: Page, fromX: number, toX: number) {
  const box = (await page.getByTestId('viewer-stage').boundingBox())!;
  const y = box.y + box.height / 2;
  await page.mouse.move(box.x + fromX, y);
  await page.mouse.down();
  await page.mouse.move(box.x + (fromX + toX) / 2, y, { steps: 4 });
  await page.mouse.move(box.x + toX, y, { steps: 4 });
  await page.mouse.up();
}

async function tagShots(page: Page) {
  // In bulk: every shot to Brakes.
  await page.getByRole('radiogroup', { name: 'Area for new and selected shots' }).getByText('Brakes', { exact: true }).click();
  await page.getByRole('button', { name: 'Apply to all 3' }).click();
  // One by one: the third shot becomes "during" with a caption.
  const third = page.getByTestId('shot-card').nth(2);
  await third.getByRole('button', { name: 'Tag this shot' }).click();
  await third.getByText('During', { exact: true }).click();
  await third.getByLabel('Caption (optional)').fill('Pad wear, rear caliper');
  await third.getByRole('button', { name: 'Done tagging' }).click();
}

describe('media on a phone', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('adds three shots with the camera button, tags them, sees upright thumbnails and swipes through the viewer', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, MECHANIC);
    const jobId = await demoJobId(b.page);
    await b.page.goto(`/jobs/${jobId}/capture`);
    await b.page.getByRole('button', { name: 'Take shots' }).waitFor();
    await shot(b.page, 'capture-empty-phone');

    await b.page.getByTestId('camera-input').setInputFiles(files);
    await b.page.getByTestId('shot-card').nth(2).waitFor();
    expect(await b.page.getByRole('progressbar').count()).toBe(3);
    await tagShots(b.page);

    await b.page.getByText('3 of 3 stored').waitFor({ timeout: 30_000 });
    await b.page.locator('[data-testid="stored-thumb"]').nth(2).waitFor({ timeout: 30_000 });
    const size = await imageSize(b.page, '[data-testid="stored-thumb"]');
    expect(size.w).toBeGreaterThan(size.h); // the EXIF-rotated first shot comes back landscape, i.e. upright
    await shot(b.page, 'capture-phone');

    await b.page.goto(`/jobs/${jobId}?section=media`);
    await b.page.locator('[data-testid="media-tile"][data-area="brakes"][data-status="ready"]').nth(2).waitFor({ timeout: 30_000 });
    await shot(b.page, 'media-grid-phone');

    await b.page.locator('[data-testid="media-tile"][data-area="brakes"] button').first().click();
    const position = b.page.getByTestId('viewer-position');
    const first = await position.textContent();
    // The job may hold seeded shots before ours: count from wherever the first brakes shot sits.
    const [k, n] = (first ?? '').split(' of ').map(Number);
    await b.page.getByTestId('viewer-image').waitFor();
    await swipe(b.page, 320, 60);
    await b.page.waitForFunction((t) => document.querySelector('[data-testid="viewer-position"]')?.textContent !== t, first);
    expect(await position.textContent()).toBe(`${k + 1} of ${n}`);
    await b.page.getByTestId('viewer-image').waitFor();
    await b.page
      .getByTestId('media-details')
      .getByText(/SHA-256 [0-9a-f]{12}…/)
      .waitFor();
    await shot(b.page, 'viewer-phone');
    await swipe(b.page, 60, 320);
    await b.page.getByText(`${k} of ${n}`, { exact: true }).waitFor();
    await b.page.keyboard.press('ArrowRight');
    await b.page.getByText(`${k + 1} of ${n}`, { exact: true }).waitFor();
  });

  it('shows the server’s reason for a refused file and keeps the others', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, MECHANIC);
    const jobId = await demoJobId(b.page);
    await b.page.goto(`/jobs/${jobId}/capture`);
    await b.page.getByTestId('camera-input').setInputFiles([makeImpostor(dir), files[1]]);
    const refused = b.page.locator('[data-testid="shot-card"][data-status="failed"]');
    await refused.getByRole('alert').waitFor({ timeout: 30_000 });
    expect((await refused.getByRole('alert').textContent())?.length).toBeGreaterThan(5);
    await b.page.locator('[data-testid="shot-card"][data-status="done"]').waitFor({ timeout: 30_000 });
    await shot(b.page, 'capture-refused-phone');
  });
});

describe('media on a desktop', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('shows the drop area, the grid with bulk re-tag, and the viewer', async () => {
    b = await openBrowser(DESKTOP);
    await signIn(b.page, MECHANIC);
    const jobId = await demoJobId(b.page);
    await b.page.goto(`/jobs/${jobId}/capture`);
    await b.page.getByText('Drop photos or videos here').waitFor();
    await shot(b.page, 'capture-desktop');

    await b.page.goto(`/jobs/${jobId}?section=media`);
    const tiles = b.page.getByTestId('media-tile');
    await tiles.first().waitFor({ timeout: 30_000 });
    await tiles.nth(0).getByRole('checkbox').check();
    await tiles.nth(1).getByRole('checkbox').check();
    await b.page.getByText('2 selected').waitFor();
    await shot(b.page, 'media-grid-desktop');
    await b.page.getByRole('button', { name: 'Clear selection' }).click();

    await tiles.first().locator('button').first().click();
    await b.page.getByTestId('media-details').waitFor();
    await b.page.waitForTimeout(300);
    await shot(b.page, 'viewer-desktop');
    await b.page.getByRole('button', { name: 'Next shot' }).click();
    await b.page.getByText(/^2 of \d+$/).waitFor();
  });
});
