import type { ShowcaseItemDto } from '@benchproof/contracts';
import { request, type Page } from 'playwright-core';
import sharp from 'sharp';
import { inject } from 'vitest';
import yauzl from 'yauzl';
import { DEMO_PASSWORD, DESKTOP, openBrowser, PHONE, signIn, type Browser } from './support/browser';
import { DESK, MANAGER, snap } from './support/records';

/** An owner link for a job, made through the API as the manager would (not sent by mail). */
async function ownerLinkByApi(jobId: number): Promise<string> {
  const req = await request.newContext({ baseURL: inject('baseURL') });
  const { csrfToken } = (await (await req.post('/api/auth/login', { data: { email: MANAGER, password: DEMO_PASSWORD } })).json()) as { csrfToken: string };
  const res = await req.post(`/api/jobs/${jobId}/owner-links`, { headers: { 'x-csrf-token': csrfToken }, data: { send: false } });
  if (!res.ok()) throw new Error(`Owner link: ${res.status()} ${await res.text()}`);
  const { url } = (await res.json()) as { url: string };
  await req.dispose();
  return new URL(url).pathname;
}

/** The manager flips the desk-access switch in Shop settings and saves. */
async function setDeskAccess(page: Page, on: boolean): Promise<void> {
  await page.goto('/settings/shop');
  const toggle = page.getByRole('switch', { name: 'Front desk may open the showcase and export from it' });
  await toggle.waitFor();
  if ((await toggle.isChecked()) !== on) await toggle.click({ force: true });
  await page.getByRole('button', { name: 'Save settings' }).click();
  await page.getByText('Settings saved.').waitFor();
}

const zipEntries = (path: string) =>
  new Promise<string[]>((resolve, reject) =>
    yauzl.open(path, { lazyEntries: false }, (err, zip) => {
      if (err) return reject(err);
      const seen: string[] = [];
      zip.on('entry', (e: yauzl.Entry) => seen.push(e.fileName)).on('end', () => resolve(seen));
    }),
  );

describe('showcase: desk access by shop setting; background zip with progress', () => {
  const open: Browser[] = [];
  afterAll(async () => {
    for (const b of open) await b.close();
  });

  it('desk sees no showcase until the manager allows it; then browses and exports, without caption or favourite controls', { timeout: 120_000 }, async () => {
    const desk = await openBrowser(DESKTOP);
    const mgr = await openBrowser(DESKTOP);
    open.push(desk, mgr);
    await signIn(desk.page, DESK);
    await desk.page.getByRole('link', { name: 'Customers & bikes' }).waitFor();
    expect(await desk.page.getByRole('link', { name: 'Showcase' }).count()).toBe(0);
    await desk.page.goto('/showcase');
    await desk.page.waitForURL((u) => u.pathname === '/jobs');

    await signIn(mgr.page, MANAGER);
    await setDeskAccess(mgr.page, true);
    await snap(mgr.page, 'shop-settings-showcase-desktop');

    await desk.page.reload();
    await desk.page.getByRole('link', { name: 'Showcase' }).click();
    const cards = desk.page.getByTestId('showcase-item');
    await cards.first().waitFor();
    expect(await cards.first().getByRole('button', { name: 'Export' }).count()).toBe(1);
    expect(await desk.page.getByRole('button', { name: 'Caption' }).count()).toBe(0);
    expect(await desk.page.getByRole('button', { name: /favourite/i }).count()).toBe(0);
    await desk.page.setViewportSize(PHONE);
    await desk.page.reload();
    await cards.first().waitFor();
    await snap(desk.page, 'showcase-library-desk-phone');

    await setDeskAccess(mgr.page, false);
    await desk.page.reload();
    await desk.page.waitForURL((u) => u.pathname === '/jobs');
  });

  it('manager zips every pair in all three sizes: progress on screen, then the zip downloads', { timeout: 180_000 }, async () => {
    const mgr = await openBrowser(PHONE);
    open.push(mgr);
    await signIn(mgr.page, MANAGER);
    await mgr.page.goto('/showcase');
    const cards = mgr.page.getByTestId('showcase-item');
    await cards.first().waitFor();
    const n = await cards.count();
    for (let i = 0; i < n; i++) await cards.nth(i).getByLabel('Select for zip').check();
    await mgr.page.getByRole('combobox', { name: 'Files in the zip' }).click();
    await mgr.page.getByRole('option', { name: 'Each card’s choice, all three sizes' }).click();
    await mgr.page.getByRole('button', { name: `Zip ${3 * n} files` }).click();
    await mgr.page.getByRole('progressbar', { name: 'Zip progress' }).waitFor();
    await mgr.page.getByText(/^(Waiting to start the zip…|Making the zip: \d+ of \d+ files)$/).waitFor();
    await snap(mgr.page, 'showcase-zip-progress-phone');
    const button = mgr.page.getByRole('button', { name: 'Download zip' });
    await button.waitFor({ timeout: 120_000 });
    await snap(mgr.page, 'showcase-zip-ready-phone');
    const [download] = await Promise.all([mgr.page.waitForEvent('download'), button.click()]);
    expect(download.suggestedFilename()).toBe('showcase.zip');
    const names = await zipEntries(await download.path());
    expect(names).toHaveLength(3 * n);
    for (const size of ['square', 'portrait', 'banner']) expect(names.filter((x) => x.endsWith(`-pair-${size}.jpg`))).toHaveLength(n);
  });
});

describe('showcase: only consented pairs; export; the owner revokes and the pair leaves', () => {
  const open: Browser[] = [];
  afterAll(async () => {
    for (const b of open) await b.close();
  });

  it('manager exports a square composed image of a demo pair; after the owner revokes, the job’s pairs are gone', { timeout: 180_000 }, async () => {
    const mgr = await openBrowser(DESKTOP);
    open.push(mgr);
    await signIn(mgr.page, MANAGER);
    await mgr.page.goto('/showcase');
    const cards = mgr.page.getByTestId('showcase-item');
    await cards.first().waitFor({ timeout: 30_000 });
    const items = (await (await mgr.page.request.get('/api/showcase/items')).json()) as ShowcaseItemDto[];
    expect(items.length).toBeGreaterThan(0);
    expect(await cards.count()).toBe(items.length);
    const jobId = items[0].jobId;
    await mgr.page
      .getByText(/^Consent .* make & model may be named$/)
      .first()
      .waitFor();
    await mgr.page.waitForFunction(() =>
      [...document.querySelectorAll('[data-testid=showcase-item] img')].every((i) => (i as HTMLImageElement).naturalWidth > 0),
    );
    await snap(mgr.page, 'showcase-library-desktop');

    // Square, both shots composed (the defaults), one tap: the file downloads.
    const first = cards.first();
    expect(await first.getByLabel('Size', { exact: true }).inputValue()).toBe('Square post 1080×1080');
    expect(await first.getByLabel('What', { exact: true }).inputValue()).toBe('Before and after together');
    const [download] = await Promise.all([mgr.page.waitForEvent('download'), first.getByRole('button', { name: 'Export' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^pair-\d+-pair-square\.jpg$/);
    const meta = await sharp(await download.path()).metadata();
    expect([meta.width, meta.height, meta.format, meta.exif]).toEqual([1080, 1080, 'jpeg', undefined]);

    await mgr.page.setViewportSize(PHONE);
    await snap(mgr.page, 'showcase-library-phone');
    await mgr.page.setViewportSize(DESKTOP);

    // The owner withdraws consent on their own page, on a phone.
    const owner = await openBrowser(PHONE);
    open.push(owner);
    await owner.page.goto(await ownerLinkByApi(jobId));
    const consent = owner.page.getByRole('switch', { name: 'Marketing consent' });
    await consent.waitFor();
    expect(await consent.isChecked()).toBe(true);
    await consent.click();
    await owner.page.getByText(/^Withdrawn on /).waitFor();
    await snap(owner.page, 'showcase-owner-revoked-phone');

    // Back in the library: the job's pairs are gone (no other job in the demo shop has consent).
    await mgr.page.reload();
    await mgr.page.getByText(/No consented pairs match/).waitFor();
    expect(await cards.count()).toBe(0);
    const after = (await (await mgr.page.request.get('/api/showcase/items')).json()) as ShowcaseItemDto[];
    expect(after.filter((i) => i.jobId === jobId)).toEqual([]);
    await snap(mgr.page, 'showcase-library-after-revoke-desktop');

    // Where the withdrawal shows on the job, the manager sees what to take down: the square exported above.
    await mgr.page.goto(`/jobs/${jobId}?section=owner`);
    const takeDown = mgr.page.getByTestId('take-down-list');
    await takeDown.getByText('Take these down').waitFor();
    await takeDown
      .getByText(/· Before and after together · Square post 1080×1080 · \d+ KB$/)
      .first()
      .waitFor();
    await snap(mgr.page, 'showcase-take-down-desktop');
  });
});
