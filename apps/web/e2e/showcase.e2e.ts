import type { ShowcaseItemDto } from '@benchproof/contracts';
import { request } from 'playwright-core';
import sharp from 'sharp';
import { inject } from 'vitest';
import { DEMO_PASSWORD, DESKTOP, openBrowser, PHONE, signIn, type Browser } from './support/browser';
import { MANAGER, snap } from './support/records';

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
  });
});
