import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { DEMO_PASSWORD, openBrowser, PHONE, shot, type Browser } from './support/browser';
import { freePort, waitForHealth } from './support/server';

const root = resolve(import.meta.dirname, '../../..');
const DEMO_DESK = 'desk@lantern-spoke.test';

/**
 * Paying online at the workstand's phone size: the owner opens their link, pays on the local fake's
 * hosted page, comes back and sees "paid"; desk sees the balance at zero and the receipt is in the
 * local inbox. Its own built server (npm run build first) pointed at a fake and a catcher on free ports.
 */
describe('payments: the owner pays the seeded ready job from their page', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-pay-browser-'));
  const procs: ChildProcess[] = [];
  let browser: Browser | null = null;
  afterAll(async () => {
    await browser?.close();
    procs.forEach((p) => p.kill('SIGTERM'));
    rmSync(dir, { recursive: true, force: true });
  });
  // The fake and the catcher run as their own processes (`npm run payments:fake`, `npm run mail`), as npm start runs them.
  const script = (name: string, env: Record<string, string>, ready: string) =>
    new Promise<void>((ok, fail) => {
      const p = spawn(process.execPath, [join(root, 'apps/api/scripts', name)], {
        cwd: root,
        env: { ...process.env, ...env },
        stdio: ['ignore', 'pipe', 'inherit'],
      });
      procs.push(p);
      p.stdout?.on('data', (d: Buffer) => d.toString().includes(ready) && ok());
      p.once('exit', (code) => fail(new Error(`${name} exited ${code}`)));
    });

  it('pays on the hosted page, shows "paid", zero balance for desk and the receipt in the inbox', async () => {
    const [port, fakePort, smtpPort, inboxPort] = [await freePort(), await freePort(), await freePort(), await freePort()];
    const base = `http://127.0.0.1:${port}`;
    const fake = { url: `http://127.0.0.1:${fakePort}` };
    const catcher = { url: `http://127.0.0.1:${inboxPort}`, smtpUrl: `smtp://127.0.0.1:${smtpPort}` };
    await script(
      'payment-fake.mjs',
      { PAYMENT_FAKE_PORT: String(fakePort), PAYMENT_FAKE_WEBHOOK_URL: `${base}/api/payments/webhook`, STRIPE_WEBHOOK_SECRET: 'whsec_browser' },
      'fake on',
    );
    await script('mail-catcher.mjs', { MAIL_SMTP_PORT: String(smtpPort), MAIL_HTTP_PORT: String(inboxPort) }, 'Catching');
    const server = spawn(process.execPath, [join(root, 'dist/apps/api/apps/api/src/main.js')], {
      cwd: root,
      stdio: 'ignore',
      env: {
        ...process.env,
        ...{ PORT: String(port), PUBLIC_URL: base, DATABASE_PATH: join(dir, 'db.sqlite'), UPLOADS_DIR: join(dir, 'uploads'), LOG_LEVEL: 'warn' },
        ...{ SMTP_URL: catcher.smtpUrl, MAIL_SWEEP_MS: '200', STRIPE_API_URL: fake.url, STRIPE_WEBHOOK_SECRET: 'whsec_browser', LOGIN_THROTTLE_LIMIT: '1000' },
      },
    });
    procs.push(server);
    await waitForHealth(base);
    browser = await openBrowser(PHONE);
    const { page, context } = browser;
    const login = await context.request.post(`${base}/api/auth/login`, { data: { email: DEMO_DESK, password: DEMO_PASSWORD } });
    const headers = { 'x-csrf-token': ((await login.json()) as { csrfToken: string }).csrfToken };
    const unpaid = (await (await context.request.get(`${base}/api/jobs?readyUnpaid=true`)).json()) as { items: { id: number; dueMinor: number }[] };
    const job = unpaid.items[0];
    expect(job.dueMinor).toBeGreaterThan(0);
    const link = (await (
      await context.request.post(`${base}/api/jobs/${job.id}/owner-links`, { headers, data: { expiresInDays: 7, send: false } })
    ).json()) as { url: string };

    await page.goto(link.url);
    const pay = page.getByRole('button', { name: /^Pay .* by card$/ });
    await pay.waitFor();
    await shot(page, 'payments-owner-due-390');
    await pay.click();
    await page.waitForURL((u) => u.href.startsWith(fake.url));
    await shot(page, 'payments-fake-checkout-390');
    await page.getByRole('button', { name: /^Pay / }).click();
    await page.waitForURL((u) => u.href.startsWith(link.url) && u.search.includes('payment=done'));
    await page.getByTestId('paid-status').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('paid-status').textContent()).toMatch(/^Paid on \d{1,2} \w+ \d{4}/);
    await shot(page, 'payments-owner-paid-390');

    await page.goto(`${base}/sign-in`);
    await page.getByLabel('E-mail').fill(DEMO_DESK);
    await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
    await page.goto(`${base}/jobs/${job.id}?section=payment`);
    await page.getByTestId('balance-due').waitFor();
    expect(await page.getByTestId('balance-due').textContent()).toBe('£0.00');
    await shot(page, 'payments-desk-paid-390');

    let receipt: { subject: string; to: string; text: string } | undefined;
    for (let i = 0; i < 60 && !receipt; i++) {
      const caught = (await (await fetch(`${catcher.url}/api/messages`)).json()) as { subject: string; to: string; text: string }[];
      receipt = caught.find((m) => m.subject.startsWith('Receipt'));
      if (!receipt) await new Promise((r) => setTimeout(r, 250));
    }
    if (!receipt) throw new Error('no receipt in the local inbox');
    expect(receipt.to).toContain('anouk.selberg@example.test');
    expect(receipt.text).toContain('paid in full');
    await page.goto(catcher.url);
    await page.getByRole('link', { name: /^Receipt/ }).waitFor();
    await shot(page, 'payments-inbox-receipt-390');
  }, 240_000); // a fresh server with the demo seed, two fakes and five pages on a shared machine
});
