import type { Page } from 'playwright-core';
import { DESKTOP, openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';

const MECHANIC = 'tobin@lantern-spoke.test';

/** An open demo job with seeded before/after shots and no pairs yet (other demo jobs show ready-made pairs). */
async function jobWithShots(page: Page): Promise<number> {
  const jobs = (await (await page.request.get('/api/jobs?open=true&pageSize=50')).json()) as { items: { id: number }[] };
  for (const j of jobs.items) {
    const media = (await (await page.request.get(`/api/jobs/${j.id}/media`)).json()) as unknown[];
    const pairs = (await (await page.request.get(`/api/jobs/${j.id}/pairs`)).json()) as unknown[];
    if (media.length && pairs.length === 0) return j.id;
  }
  throw new Error('No demo job with unpaired media');
}

/** The job the phone test built its pair on; the desktop test views that pair. */
let pairedJobId: number | undefined;

/** Suggestions appear once the background hashes of every seeded shot are in. */
async function openPairs(page: Page, jobId: number) {
  await page.goto(`/jobs/${jobId}?section=pairs`);
  await page.getByRole('heading', { name: 'Suggested pairs' }).waitFor();
  await page.waitForFunction(() => !document.body.innerText.includes('Comparing framing'), null, { timeout: 30_000 });
  await page.getByTestId('pair-suggestion').nth(3).waitFor({ timeout: 30_000 });
}

const knob = (page: Page) => page.getByRole('slider', { name: 'Divider between before and after' });
const divider = async (page: Page) => Number(await knob(page).getAttribute('aria-valuenow'));

/** Drags across the picture from one fraction of its width to another, with the mouse. */
async function mouseDrag(page: Page, from: number, to: number) {
  const box = (await page.getByTestId('compare-slider').first().boundingBox())!;
  const y = box.y + box.height * 0.7;
  await page.mouse.move(box.x + box.width * from, y);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width * ((from + to) / 2), y, { steps: 5 });
  await page.mouse.move(box.x + box.width * to, y, { steps: 5 });
  await page.mouse.up();
}

/** The same with a finger, through the DevTools protocol's touch events. */
async function touchDrag(page: Page, from: number, to: number) {
  const box = (await page.getByTestId('compare-slider').boundingBox())!;
  const y = box.y + box.height * 0.7;
  const cdp = await page.context().newCDPSession(page);
  const at = (f: number) => [{ x: box.x + box.width * f, y }];
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: at(from) });
  for (let i = 1; i <= 6; i++) await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: at(from + ((to - from) * i) / 6) });
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
  await cdp.detach();
}

describe('before/after pairs', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('on a phone: pairs the top suggestion with one tap, then drags the slider by finger and keys', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, MECHANIC);
    const jobId = await jobWithShots(b.page);
    pairedJobId = jobId;
    await openPairs(b.page, jobId);
    await shot(b.page, 'pairs-suggestions-phone');

    const first = b.page.getByTestId('pair-suggestion').first();
    const beforeAlt = await first.getByRole('img').first().getAttribute('alt');
    await first.getByRole('button', { name: 'Pair these' }).click();
    await b.page.getByTestId('pair-card').first().waitFor();
    // The paired shots leave the suggestions.
    await b.page.waitForFunction(
      (alt) => ![...document.querySelectorAll('[data-testid="pair-suggestion"] img')].some((i) => i.getAttribute('alt') === alt),
      beforeAlt,
    );

    const slider = b.page.getByTestId('compare-slider');
    await slider.scrollIntoViewIfNeeded();
    await b.page.waitForFunction(() =>
      [...document.querySelectorAll('[data-testid="compare-slider"] img')].every((i) => (i as HTMLImageElement).naturalWidth > 0),
    );
    expect(await divider(b.page)).toBe(50);

    await touchDrag(b.page, 0.5, 0.2);
    expect(await divider(b.page)).toBeGreaterThanOrEqual(17);
    expect(await divider(b.page)).toBeLessThanOrEqual(23);
    // What the divider shows: the before layer is cut off at its position.
    expect(await slider.locator('div[style*="clip-path"]').getAttribute('style')).toMatch(/inset\(0(px)? 8\d(\.\d+)?% 0(px)? 0(px)?\)/);
    await shot(b.page, 'pairs-slider-phone');

    await knob(b.page).focus();
    await b.page.keyboard.press('End');
    expect(await divider(b.page)).toBe(100);
    await b.page.keyboard.press('ArrowLeft');
    expect(await divider(b.page)).toBe(98);
  });

  it('on a desktop: drags the slider with the mouse and switches to side by side', async () => {
    b = await openBrowser(DESKTOP);
    await signIn(b.page, MECHANIC);
    const jobId = pairedJobId ?? (await jobWithShots(b.page));
    await b.page.goto(`/jobs/${jobId}?section=pairs`);
    await b.page.getByTestId('pair-card').first().waitFor();
    await b.page.waitForFunction(() =>
      [...document.querySelectorAll('[data-testid="compare-slider"] img')].every((i) => (i as HTMLImageElement).naturalWidth > 0),
    );

    await b.page.getByTestId('compare-slider').first().scrollIntoViewIfNeeded();
    await mouseDrag(b.page, 0.5, 0.75);
    expect(Math.abs((await divider(b.page)) - 75)).toBeLessThanOrEqual(3);
    await shot(b.page, 'pairs-slider-desktop');

    await b.page.getByText('Side by side', { exact: true }).first().click();
    await b.page.getByTestId('side-by-side').waitFor();
    expect(await b.page.getByTestId('side-by-side').getByRole('img').count()).toBe(2);
    await shot(b.page, 'pairs-side-by-side-desktop');
  });
});
