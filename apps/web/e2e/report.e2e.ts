import { createHash } from 'node:crypto';
import { DESKTOP, openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';

const MANAGER = 'mara@lantern-spoke.test';
const DESK = 'desk@lantern-spoke.test';
// The demo job waiting on the owner (seeds/src/records.ts): three findings with prices.
const JOB_ID = 3;

describe('bench report: branding, draft, issue, public verify', () => {
  const open: Browser[] = [];
  const browser = async (viewport: typeof PHONE) => {
    const b = await openBrowser(viewport);
    open.push(b);
    return b;
  };
  afterAll(async () => {
    for (const b of open) await b.close();
  });

  it('the settings page says when a brand colour is too light for text and shows the cover live', async () => {
    const { page } = await browser(DESKTOP);
    await signIn(page, MANAGER);
    await page.goto('/settings/shop');
    await page.getByLabel('Primary colour').fill('#FFD400');
    await page.getByLabel('Primary colour').blur();
    await expect.poll(() => page.getByText(/Reports print headings in the darker/).count()).toBeGreaterThan(0);
    await expect.poll(() => page.getByLabel('Cover preview').count()).toBe(1);
    await shot(page, 'report-branding-desktop');
  });

  it(
    'desk makes a draft, previews its pages, issues version 1; the PDF verifies on the public page and a changed copy does not',
    { timeout: 240_000 },
    async () => {
      const { page, context } = await browser(PHONE);
      await signIn(page, DESK);
      await page.goto(`/jobs/${JOB_ID}?section=report`);
      await page.getByRole('button', { name: /Make a( new)? draft/ }).click();
      const issue = page.getByRole('button', { name: /Issue this draft as version/ });
      await issue.waitFor({ timeout: 60_000 });
      await page.getByText('Page images', { exact: true }).click();
      const pageImage = page.getByAltText(/Page 1 of \d+/);
      await pageImage.waitFor();
      await expect.poll(() => pageImage.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth), { timeout: 30_000 }).toBeGreaterThan(500);
      await shot(page, 'report-draft-phone');
      // Issuing cannot be undone: the first tap asks, nothing is issued until the second.
      await issue.click();
      const ask = page.getByRole('group', { name: /^Issue version 1\? An issued report never changes/ });
      await ask.waitFor();
      expect(await page.getByRole('link', { name: 'Download' }).count()).toBe(0);
      await shot(page, 'report-issue-confirm-phone');
      await ask.getByRole('button', { name: 'Issue version 1' }).click();
      const download = page.getByRole('link', { name: 'Download' }).first();
      await download.waitFor({ timeout: 60_000 });
      await shot(page, 'report-issued-phone');

      const href = await download.getAttribute('href');
      const pdf = Buffer.from(await (await context.request.get(href!)).body());
      expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');

      // A stranger, not signed in, checks the file: hashed in the browser, never uploaded.
      const stranger = await browser(PHONE);
      const uploads: string[] = [];
      stranger.page.on('request', (r) => r.method() !== 'GET' && uploads.push(r.url()));
      await stranger.page.goto('/verify');
      await stranger.page.locator('input[type=file]').setInputFiles({ name: 'report.pdf', mimeType: 'application/pdf', buffer: pdf });
      await stranger.page.getByText('Genuine report').waitFor();
      await expect.poll(() => stranger.page.getByText(/Job J-\d{4}-\d{4} · version 1/).count()).toBe(1);
      await shot(stranger.page, 'report-verify-genuine-phone');
      const changed = Buffer.from(pdf);
      changed[changed.length >> 1] ^= 1;
      await stranger.page.locator('input[type=file]').setInputFiles({ name: 'changed.pdf', mimeType: 'application/pdf', buffer: changed });
      await stranger.page.getByText('Not a report we issued').waitFor();
      await shot(stranger.page, 'report-verify-changed-phone');
      expect(uploads).toEqual([]);

      // The fingerprint typed by hand (desktop) verifies too.
      const desk = await browser(DESKTOP);
      await desk.page.goto('/verify');
      await desk.page.getByLabel('Fingerprint').fill(createHash('sha256').update(pdf).digest('hex'));
      await desk.page.getByRole('button', { name: 'Check' }).click();
      await desk.page.getByText('Genuine report').waitFor();
      await shot(desk.page, 'report-verify-desktop');
    },
  );
});
