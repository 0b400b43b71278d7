import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { DEMO_PASSWORD, openBrowser, PHONE, shot, type Browser } from './support/browser';

const root = resolve(import.meta.dirname, '../../..');
const DEMO_DESK = 'desk@lantern-spoke.test';
const AUTH = { TWILIO_ACCOUNT_SID: `AC${'7'.repeat(32)}`, TWILIO_AUTH_TOKEN: 'browser_text_token' };

const freePort = () =>
  new Promise<number>((ok) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => ok(port));
    });
  });

async function waitForHealth(base: string): Promise<void> {
  for (let i = 0; i < 240; i++) {
    const ok = await fetch(`${base}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (ok) return;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error('the API did not start');
}

/**
 * Texts at the workstand's phone size: desk sends the owner link of the demo customer who prefers
 * texts, sees the text delivered under Messages, and the link in the local text inbox opens the owner
 * page. Its own built server (npm run build first) with the text fake as its own process, as npm start runs it.
 */
describe('texts: the demo customer who prefers texts gets the owner link by text', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-texts-browser-'));
  const procs: ChildProcess[] = [];
  let browser: Browser | null = null;
  afterAll(async () => {
    await browser?.close();
    procs.forEach((p) => p.kill('SIGTERM'));
    rmSync(dir, { recursive: true, force: true });
  });

  it('desk sends the link, sees "Delivered to the phone", and the link in the text inbox opens the owner page', async () => {
    const [port, fakePort] = [await freePort(), await freePort()];
    const base = `http://127.0.0.1:${port}`;
    const fakeUrl = `http://127.0.0.1:${fakePort}`;
    await new Promise<void>((ok, fail) => {
      const p = spawn(process.execPath, [join(root, 'apps/api/scripts/text-fake.mjs')], {
        cwd: root,
        env: { ...process.env, ...AUTH, TEXT_FAKE_PORT: String(fakePort), PUBLIC_URL: base },
        stdio: ['ignore', 'pipe', 'inherit'],
      });
      procs.push(p);
      p.stdout?.on('data', (d: Buffer) => d.toString().includes('fake on') && ok());
      p.once('exit', (code) => fail(new Error(`text-fake exited ${code}`)));
    });
    const server = spawn(process.execPath, [join(root, 'dist/apps/api/apps/api/src/main.js')], {
      cwd: root,
      stdio: 'ignore',
      env: {
        ...process.env,
        ...{ PORT: String(port), PUBLIC_URL: base, DATABASE_PATH: join(dir, 'db.sqlite'), UPLOADS_DIR: join(dir, 'uploads'), LOG_LEVEL: 'warn' },
        ...{ ...AUTH, TWILIO_API_URL: fakeUrl, MAIL_CATCHER: 'false', LOGIN_THROTTLE_LIMIT: '1000' },
      },
    });
    procs.push(server);
    await waitForHealth(base);
    browser = await openBrowser(PHONE);
    const { page, context } = browser;
    await context.request.post(`${base}/api/auth/login`, { data: { email: DEMO_DESK, password: DEMO_PASSWORD } });
    const found = (await (await context.request.get(`${base}/api/jobs?q=Selberg&pageSize=50`)).json()) as {
      items: { id: number; status: string; customer: { id: number; name: string } }[];
    };
    const job = found.items.find((j) => j.customer.name === 'Anouk Selberg' && j.status !== 'collected' && j.status !== 'cancelled');
    if (!job) throw new Error('no open job of the demo customer who prefers texts');

    await page.goto(`${base}/jobs/${job.id}?section=owner`);
    await page.getByRole('button', { name: 'Create and send link' }).click();
    await page.getByText('Text queued to the owner (they prefer texts).').waitFor();
    await page.goto(`${base}/jobs/${job.id}?section=messages`);
    const card = page.getByTestId('text-message').first();
    await card.getByText('Delivered to the phone', { exact: true }).waitFor({ timeout: 20_000 });
    expect(await card.textContent()).toContain('To +61491570156');
    await card.scrollIntoViewIfNeeded();
    await shot(page, 'texts-desk-status-390');
    // The customer page lists the customer's texts too, with a way back to the job.
    await page.goto(`${base}/customers/${job.customer.id}`);
    const onCustomer = page.getByTestId('customer-texts').getByTestId('text-message').first();
    await onCustomer.getByText('Delivered to the phone', { exact: true }).waitFor();
    expect(await onCustomer.getByRole('link', { name: '(open the job)' }).getAttribute('href')).toBe(`/jobs/${job.id}`);

    await page.goto(fakeUrl);
    const text = page.getByTestId('text').first();
    expect(await text.textContent()).toContain('Lantern & Spoke Workshop: your bike');
    await shot(page, 'texts-inbox-390');
    await text.getByRole('link').click();
    await page.waitForURL((u) => u.href.startsWith(`${base}/o/`));
    await page.getByText('Anouk', { exact: false }).first().waitFor();
    await shot(page, 'texts-owner-page-390');
  }, 240_000); // a fresh server with the demo seed and the fake on a shared machine
});
