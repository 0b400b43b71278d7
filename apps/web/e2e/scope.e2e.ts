import type { Page } from 'playwright-core';
import { DESKTOP, openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';
import { demoJobId } from './support/media';

const MECHANIC = 'tobin@lantern-spoke.test';

/** Chromium's fake camera (--use-fake-device-for-media-stream) is playing once frames have a size. */
async function waitForLivePicture(page: Page) {
  await page.waitForFunction(
    () => {
      const v = document.querySelector<HTMLVideoElement>('[data-testid="live-video"]');
      return Boolean(v && v.videoWidth > 0 && v.readyState >= 2);
    },
    undefined,
    { timeout: 20_000 },
  );
}

describe('scope capture', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('grabs two stills from the live camera on a phone and finds them in the grid as scope / frame interior', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, MECHANIC);
    const jobId = await demoJobId(b.page);
    const before = await b.page.request.get(`/api/jobs/${jobId}/media?kind=scope_still&area=frame_interior`).then((r) => r.json() as Promise<unknown[]>);

    await b.page.goto(`/jobs/${jobId}/scope`);
    await waitForLivePicture(b.page);
    expect(await b.page.getByRole('combobox', { name: 'Camera or scope' }).isVisible()).toBe(true);
    const grab = b.page.getByRole('button', { name: 'Grab still' });
    await grab.click();
    await b.page.waitForTimeout(400); // a different frame of the moving test pattern
    await grab.click();
    await b.page.locator('[data-testid="scope-still"][data-status="done"]').nth(1).waitFor({ timeout: 30_000 });
    await b.page.locator('[data-testid="scope-still"] [data-testid="stored-thumb"]').nth(1).waitFor({ timeout: 30_000 });
    await shot(b.page, 'scope-phone');

    await b.page.goto(`/jobs/${jobId}?section=media`);
    await b.page.getByRole('combobox', { name: 'Kind' }).click();
    await b.page.getByRole('option', { name: 'Scope still' }).click();
    const tiles = b.page.locator('[data-testid="media-tile"][data-kind="scope_still"][data-area="frame_interior"]');
    await tiles.nth(before.length + 1).waitFor({ timeout: 30_000 });
    expect(await tiles.count()).toBe(before.length + 2);
    await b.page.getByRole('heading', { name: 'Before' }).waitFor();
    await shot(b.page, 'media-grid-scope-phone');
  });

  it('shows the live scope page and the frame-step player on a desktop', async () => {
    b = await openBrowser(DESKTOP);
    await signIn(b.page, MECHANIC);
    const jobId = await demoJobId(b.page);
    await b.page.goto(`/jobs/${jobId}/scope`);
    await waitForLivePicture(b.page);
    await shot(b.page, 'scope-desktop');
    await b.page.getByRole('tab', { name: 'From a video' }).click();
    await b.page.getByRole('button', { name: 'Forward 1 frame' }).waitFor();
    await shot(b.page, 'scope-video-desktop');
  });
});
