import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { request, type Page } from 'playwright-core';
import { inject } from 'vitest';
import { DEMO_PASSWORD, openBrowser, PHONE, SHOTS_DIR, signIn, type Browser } from './support/browser';
import { ownerJobByApi } from './support/owner';
import { DESK, TOBIN } from './support/records';

/** axe-core's own engine, injected as a script (no wrapper package). */
const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

/** Serious and critical axe violations on the page as it stands, one line each with a few of its elements. */
async function seriousViolations(page: Page): Promise<string[]> {
  // page.addScriptTag is refused by the app's Content-Security-Policy (script-src 'self'); evaluate runs outside it
  await page.evaluate(AXE_SOURCE);
  return page.evaluate(async () => {
    type Node = { target: string[]; any: { message: string }[] };
    type Axe = { run: (ctx: Document, o: object) => Promise<{ violations: { id: string; impact: string; nodes: Node[] }[] }> };
    const result = await (window as unknown as { axe: Axe }).axe.run(document, { resultTypes: ['violations'] });
    return result.violations
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map(
        (v) =>
          `${v.id} (${v.impact}): ${v.nodes
            .slice(0, 3)
            // The check's own words (for contrast: both colours and the ratio) say what to change.
            .map((n) => `${n.target.join(' ')} — ${n.any[0]?.message ?? ''}`)
            .join(' | ')}`,
      );
  });
}

/**
 * Visible tappable controls smaller than 44×44 px (WCAG 2.5.5 target size). A checkbox or switch is tapped
 * through its label, so the label is measured; a text link inside a paragraph is exempt, as the standard allows.
 */
async function smallTargets(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    for (const el of document.querySelectorAll<HTMLElement>('button, a, input, [role=button], [role=slider]')) {
      if ((el as HTMLInputElement).type === 'hidden' || el.closest('[aria-hidden=true]')) continue;
      if (el.tagName === 'A' && el.closest('p')) continue;
      const input = el as HTMLInputElement;
      const parts = el.matches('input[type=checkbox], input[type=radio]') ? [el, ...(input.labels ?? [])] : [el];
      const rects = parts.map((p) => p.getBoundingClientRect()).filter((b) => b.width > 0 && b.height > 0);
      if (rects.length === 0 || getComputedStyle(el).visibility === 'hidden') continue;
      const top = Math.min(...rects.map((b) => b.top));
      const left = Math.min(...rects.map((b) => b.left));
      const r = { width: Math.max(...rects.map((b) => b.right)) - left, height: Math.max(...rects.map((b) => b.bottom)) - top };
      if (r.width < 43.5 || r.height < 43.5) {
        const name = el.getAttribute('aria-label') ?? el.textContent?.trim().slice(0, 30) ?? '';
        out.push(`${el.tagName.toLowerCase()} "${name}" ${Math.round(r.width)}x${Math.round(r.height)}`);
      }
    }
    return out;
  });
}

async function check(page: Page, screen: string): Promise<void> {
  await page.screenshot({ path: join(SHOTS_DIR, `accessibility-${screen.replace(/\W+/g, '-')}-phone.png`), fullPage: true });
  expect({ screen, violations: await seriousViolations(page) }).toEqual({ screen, violations: [] });
  expect({ screen, small: await smallTargets(page) }).toEqual({ screen, small: [] });
}

/** The desk creates an owner link through the API, as the job's owner-link section does. */
async function ownerLinkPath(jobId: number): Promise<string> {
  const req = await request.newContext({ baseURL: inject('baseURL') });
  const { csrfToken } = (await (await req.post('/api/auth/login', { data: { email: DESK, password: DEMO_PASSWORD } })).json()) as { csrfToken: string };
  const res = await req.post(`/api/jobs/${jobId}/owner-links`, { headers: { 'x-csrf-token': csrfToken }, data: { expiresInDays: 7, send: false } });
  if (!res.ok()) throw new Error(`owner link: ${res.status()} ${await res.text()}`);
  const { url } = (await res.json()) as { url: string };
  await req.dispose();
  return new URL(url).pathname;
}

describe('accessibility on the phone (390×844): axe serious/critical and 44 px targets', () => {
  const open: Browser[] = [];
  afterAll(async () => {
    for (const b of open) await b.close();
  });

  it('owner page and sign-in', { timeout: 90_000 }, async () => {
    const job = await ownerJobByApi();
    const owner = await openBrowser(PHONE);
    open.push(owner);
    await owner.page.goto(await ownerLinkPath(job.id));
    await owner.page.getByRole('link', { name: 'Call' }).waitFor();
    await owner.page.mouse.wheel(0, 5000);
    await owner.page.getByRole('switch', { name: 'Marketing consent' }).waitFor();
    await check(owner.page, 'owner page');

    const staff = await openBrowser(PHONE);
    open.push(staff);
    await staff.page.goto('/sign-in');
    await staff.page.getByRole('button', { name: 'Sign in' }).waitFor();
    await check(staff.page, 'sign-in');
  });

  it('the mechanic’s jobs list, a job, capture and the annotation editor', { timeout: 120_000 }, async () => {
    const b = await openBrowser(PHONE, { touch: true });
    open.push(b);
    const { page } = b;
    await signIn(page, TOBIN);
    await page.goto('/jobs');
    await page
      .getByRole('link', { name: /^J-\d{4}-\d{4}/ })
      .first()
      .waitFor({ timeout: 15_000 });
    await check(page, 'jobs list');

    const { jobId, mediaId } = await photoJob(page);
    await page.goto(`/jobs/${jobId}`);
    await page
      .getByText(/^Job J-\d{4}-\d{4}$/)
      .first()
      .waitFor({ timeout: 15_000 });
    await page.waitForLoadState('networkidle');
    await check(page, 'job page');

    await page.goto(`/jobs/${jobId}/capture`);
    await page.getByRole('button', { name: 'Take shots' }).waitFor({ timeout: 15_000 });
    await check(page, 'capture');

    await page.goto(`/jobs/${jobId}/media/${mediaId}/annotate`);
    await page.getByTestId('annotate-stage').waitFor({ timeout: 15_000 });
    await check(page, 'annotate');
  });
});

/** A job of the mechanic's with a photo whose derivatives are ready (the demo has them). */
async function photoJob(page: Page): Promise<{ jobId: number; mediaId: number }> {
  const jobs = (await (await page.request.get('/api/jobs?pageSize=20')).json()) as { items: { id: number }[] };
  for (const { id } of jobs.items) {
    const media = (await (await page.request.get(`/api/jobs/${id}/media`)).json()) as { id: number; kind: string; status: string }[];
    const photo = media.find((m) => m.kind === 'photo' && m.status === 'ready');
    if (photo) return { jobId: id, mediaId: photo.id };
  }
  throw new Error('No demo photo found');
}
