import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { Page } from 'playwright-core';
import { DEMO_PASSWORD, openBrowser, PHONE, shot, type Browser } from './support/browser';
import { freePort, waitForHealth } from './support/server';

const root = resolve(import.meta.dirname, '../../..');
const MANAGER = 'mara@lantern-spoke.test';

function start(args: string[], env: Record<string, string>, readyText?: string): Promise<ChildProcess> {
  const proc = spawn(process.execPath, args, { cwd: root, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'inherit'] });
  if (!readyText) return Promise.resolve(proc);
  return new Promise((ok, fail) => {
    proc.stdout?.on('data', (d: Buffer) => d.toString().includes(readyText) && ok(proc));
    proc.once('exit', (code) => fail(new Error(`${args[0]} exited ${code}`)));
  });
}

/** Every tappable control on the page is at least 44 px both ways (the workstand rule). */
async function smallTargets(page: Page, within = 'main'): Promise<string[]> {
  return page.evaluate(
    (root) =>
      [...document.querySelectorAll(['button', 'a[href]', 'input[type=checkbox]'].flatMap((t) => [`${root} ${t}`, `[role=dialog] ${t}`]).join(', '))]
        .map((el) => {
          const target = el.closest('label') ?? el.closest('.mantine-Checkbox-body') ?? el;
          const r = target.getBoundingClientRect();
          return { name: (el.textContent ?? el.getAttribute('aria-label') ?? '').trim(), w: r.width, h: r.height, inline: el.closest('p') !== null };
        })
        .filter((t) => t.w > 0 && !t.inline && (t.w < 44 || t.h < 44))
        .map((t) => `${t.name} ${Math.round(t.w)}x${Math.round(t.h)}`),
    within,
  );
}

/**
 * The manager's operations screens at the workstand's phone size, on a server of their own (npm run build first):
 * an owner e-mail fails while the mail server is down, shows on "Failed work" in plain words and goes out once
 * retried; "Back up now" adds a backup to the list; the customer's data downloads as a zip; erasing a customer
 * says what is kept and why and needs a confirmation.
 */
describe('operations: failed work, backups, customer data and erasure', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-ops-browser-'));
  const procs: ChildProcess[] = [];
  let browser: Browser | null = null;
  let base = '';
  let smtpPort = 0;
  let inboxPort = 0;
  afterAll(async () => {
    await browser?.close();
    procs.forEach((p) => p.kill('SIGTERM'));
    rmSync(dir, { recursive: true, force: true });
  });

  beforeAll(async () => {
    const port = await freePort();
    [smtpPort, inboxPort] = [await freePort(), await freePort()];
    base = `http://127.0.0.1:${port}`;
    const env = { PORT: String(port), PUBLIC_URL: base, DATABASE_PATH: join(dir, 'db.sqlite'), UPLOADS_DIR: join(dir, 'uploads'), LOG_LEVEL: 'warn' };
    // Nothing listens on the SMTP port yet: the owner's e-mail fails on its one quick attempt (a refused connection).
    const mail = {
      SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
      MAIL_CATCHER: 'false',
      MAIL_MAX_ATTEMPTS: '1',
      LOGIN_THROTTLE_LIMIT: '1000',
      BACKUP_EVERY_HOURS: '0',
    };
    procs.push(await start([join(root, 'dist/apps/api/apps/api/src/main.js')], { ...env, ...mail }));
    await waitForHealth(base);
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await page.goto(`${base}/sign-in`);
    await page.getByLabel('E-mail').fill(MANAGER);
    await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
  });

  it('shows a failed e-mail in plain words, and "Try again now" sends it once the mail server is back', async () => {
    const { page, context } = browser!;
    const csrf = ((await (await context.request.get(`${base}/api/auth/session`)).json()) as { csrfToken: string }).csrfToken;
    const jobs = (await (await context.request.get(`${base}/api/jobs?pageSize=50`)).json()) as {
      items: { id: number; number: string; status: string; customer: { id: number } }[];
    };
    // An open job whose owner prefers e-mail (an owner who prefers texts gets the link by text instead).
    let job: { id: number; number: string } | undefined;
    for (const j of jobs.items.filter((i) => i.status !== 'collected' && i.status !== 'cancelled')) {
      const owner = (await (await context.request.get(`${base}/api/customers/${j.customer.id}`)).json()) as { preferredChannel: string };
      if (owner.preferredChannel === 'email') {
        job = j;
        break;
      }
    }
    if (!job) throw new Error('the demo has no open job of an owner who prefers e-mail');
    const link = await context.request.post(`${base}/api/jobs/${job.id}/owner-links`, { headers: { 'x-csrf-token': csrf }, data: { send: true } });
    expect(link.status()).toBe(201);

    await page.goto(`${base}/settings/work`);
    const card = page.getByTestId('failed-work').filter({ hasText: `Job ${job.number}` });
    for (let i = 0; i < 40 && (await card.count()) === 0; i++) await page.waitForTimeout(500).then(() => page.reload());
    await expect(card.getByText('An e-mail to a customer').count()).resolves.toBe(1);
    await expect(card.getByText('Why: Another server (such as the mail server) could not be reached.').count()).resolves.toBe(1);
    await expect(card.getByText(/after 1 try\. It tries again by itself/).count()).resolves.toBe(1);
    expect(await smallTargets(page)).toEqual([]);
    await shot(page, 'ops-failed-work-phone');

    procs.push(
      await start([join(root, 'apps/api/scripts/mail-catcher.mjs')], { MAIL_SMTP_PORT: String(smtpPort), MAIL_HTTP_PORT: String(inboxPort) }, 'inbox at'),
    );
    await expect(card.getByRole('link', { name: `Job ${job.number}` }).getAttribute('href')).resolves.toBe(`/jobs/${job.id}`);
    await card.getByRole('button', { name: 'Try again now' }).click();
    await page.getByText('Nothing has failed').waitFor({ timeout: 20_000 });
    let messages: { subject: string }[] = [];
    for (let i = 0; i < 40 && messages.length === 0; i++) {
      messages = (await (await fetch(`http://127.0.0.1:${inboxPort}/api/messages`)).json()) as { subject: string }[];
      if (messages.length === 0) await new Promise((r) => setTimeout(r, 250));
    }
    expect(messages).toHaveLength(1);
    expect(messages[0].subject).toContain(job.number);
    await shot(page, 'ops-failed-work-none-phone');
  });

  it('"Back up now" adds a backup with its time and size, and says restore is a server command', async () => {
    const { page } = browser!;
    await page.goto(`${base}/settings/data`);
    await page.getByText('No backup yet.').waitFor();
    await page.getByRole('button', { name: 'Back up now' }).click();
    await page.getByText(/^Backup made: records \d/).waitFor({ timeout: 30_000 });
    await expect(page.getByTestId('backup').count()).resolves.toBe(1);
    await expect(
      page
        .getByTestId('backup')
        .getByText(/^Records [\d.]+ (KB|MB); refers to \d+ stored files/)
        .count(),
    ).resolves.toBe(1);
    await expect(page.getByText('npm run restore').count()).resolves.toBe(1);
    const download = page.getByRole('link', { name: 'Download everything (zip)' });
    expect(await download.getAttribute('href')).toBe('/api/shop/export');
    expect(await smallTargets(page)).toEqual([]);
    await shot(page, 'ops-backups-phone');
  });

  it('downloads the customer’s data, and erasing needs the confirmation and says which photos are kept', async () => {
    const { page, context } = browser!;
    const customers = (await (await context.request.get(`${base}/api/customers?pageSize=50`)).json()) as { items: { id: number; name: string }[] };
    const customer = customers.items[0];
    await page.goto(`${base}/customers/${customer.id}`);
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download this customer’s data' }).click()]);
    const zip = await download.path().then((p) => import('node:fs').then((fs) => fs.readFileSync(p)));
    expect(zip.subarray(0, 2).toString()).toBe('PK');
    expect(download.suggestedFilename()).toMatch(new RegExp(`^customer-${customer.id}-export-.*\\.zip$`));

    await page.getByRole('button', { name: 'Erase this customer' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText(/Photos and videos of jobs handed back to the customer\. They show only the bike and the work/).waitFor();
    await expect(dialog.getByText('Photos and videos of jobs that were never handed back.').count()).resolves.toBe(1);
    const erase = dialog.getByRole('button', { name: 'Erase for good' });
    expect(await erase.isDisabled()).toBe(true);
    // Measured once the dialog has opened: mid-transition it is scaled down, and its close button measured just under 44 px.
    await page.waitForFunction(() => {
      const d = document.querySelector('[role=dialog]');
      return d !== null && ['none', 'matrix(1, 0, 0, 1, 0, 0)'].includes(getComputedStyle(d).transform) && getComputedStyle(d).opacity === '1';
    });
    // The customer page's own buttons and links are older than this screen; the new section and the dialog are checked.
    expect(await smallTargets(page, '[data-testid=customer-data]')).toEqual([]);
    await shot(page, 'ops-erase-confirm-phone');
    await dialog.getByLabel('The customer asked for this, and I have checked it is them').check();
    await erase.click();
    await dialog.getByText('Customer erased').waitFor({ timeout: 20_000 });
    await shot(page, 'ops-erase-done-phone');
    const after = (await (await context.request.get(`${base}/api/customers/${customer.id}`)).json()) as { name: string; email: string | null };
    expect(after.name).toBe(`Erased customer ${customer.id}`);
    expect(after.email).toBeNull();
  });
});
