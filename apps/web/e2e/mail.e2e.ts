import { spawn, type ChildProcess } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { Document, Page as PdfPage, renderToBuffer, Text } from '@react-pdf/renderer';
import { createElement } from 'react';
import { DESKTOP, openBrowser, PHONE, shot, type Browser } from './support/browser';

const root = resolve(import.meta.dirname, '../../..');
const DEMO_DESK = 'desk@lantern-spoke.test';
const DEMO_PASSWORD = 'bench-demo-2026';

const freePort = () =>
  new Promise<number>((ok) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => ok(port));
    });
  });

function start(args: string[], env: Record<string, string>, readyText: string): Promise<ChildProcess> {
  const proc = spawn(process.execPath, args, { cwd: root, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'inherit'] });
  return new Promise((ok, fail) => {
    proc.stdout?.on('data', (d: Buffer) => d.toString().includes(readyText) && ok(proc));
    proc.once('exit', (code) => fail(new Error(`${args[0]} exited ${code}`)));
  });
}

/**
 * The mail path in the browser: the relay is down so the report e-mail finally fails, the job
 * page says so, desk presses "Send again" once the relay is back, and the message with its PDF
 * is read in the local catcher's inbox page. Its own built server (npm run build), with the
 * issued report served from a file, since the reports feature lives on another branch.
 */
describe('mail: failed report e-mail, resend, and the local inbox', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-mail-browser-'));
  const procs: ChildProcess[] = [];
  let browser: Browser | null = null;
  afterAll(async () => {
    await browser?.close();
    procs.forEach((p) => p.kill('SIGTERM'));
    rmSync(dir, { recursive: true, force: true });
  });

  it('shows the failure, resends, and the owner’s e-mail with the PDF appears in the inbox', async () => {
    const [httpPort, smtpPort, inboxPort] = [await freePort(), await freePort(), await freePort()];
    procs.push(
      await start(
        [join(root, 'apps/api/test/support/mail-child.cjs')],
        {
          PORT: String(httpPort),
          DATABASE_PATH: join(dir, 'db.sqlite'),
          UPLOADS_DIR: join(dir, 'uploads'),
          SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
          TEST_REPORT_FILE: join(dir, 'report.json'),
          MAIL_MAX_ATTEMPTS: '1',
          MAIL_SWEEP_MS: '200',
          LOGIN_THROTTLE_LIMIT: '1000',
        },
        'ready',
      ),
    );
    const base = `http://127.0.0.1:${httpPort}`;
    browser = await openBrowser(PHONE);
    const { page, context } = browser;
    const login = await context.request.post(`${base}/api/auth/login`, { data: { email: DEMO_DESK, password: DEMO_PASSWORD } });
    const headers = { 'x-csrf-token': ((await login.json()) as { csrfToken: string }).csrfToken };
    const jobs = (await (await context.request.get(`${base}/api/jobs?pageSize=50`)).json()) as { items: { id: number; status: string; number: string }[] };
    const job = jobs.items.find((j) => j.status === 'ready') ?? jobs.items[0];
    const pdf = await renderToBuffer(
      createElement(Document, null, createElement(PdfPage, { size: 'A4' }, createElement(Text, null, `Bench report ${job.number}`))),
    );
    writeFileSync(join(dir, 'report.pdf'), pdf);
    writeFileSync(join(dir, 'report.json'), JSON.stringify({ reportId: 1, jobId: job.id, pdf: join(dir, 'report.pdf') }));
    expect((await context.request.post(`${base}/api/jobs/${job.id}/reports/1/send`, { headers, data: { to: 'owner.browser@example.test' } })).status()).toBe(
      202,
    );

    await page.goto(`${base}/jobs/${job.id}`);
    await page.getByText('An e-mail to the owner was not delivered').waitFor({ timeout: 20_000 });
    await shot(page, 'mail-failed-banner-phone');
    await page.getByRole('button', { name: 'See e-mails' }).click();
    await page.getByText('Not delivered').waitFor();
    await shot(page, 'mail-failed-phone');

    procs.push(
      await start([join(root, 'apps/api/scripts/mail-catcher.mjs')], { MAIL_SMTP_PORT: String(smtpPort), MAIL_HTTP_PORT: String(inboxPort) }, 'inbox at'),
    );
    await page.getByRole('button', { name: 'Send again' }).click();
    await page.getByText('Delivered to mail server').waitFor({ timeout: 20_000 });
    await shot(page, 'mail-delivered-phone');

    const inbox = `http://127.0.0.1:${inboxPort}`;
    await page.setViewportSize(DESKTOP);
    await page.goto(inbox);
    const subject = page.getByRole('link', { name: new RegExp(`job ${job.number}`) });
    await expect(subject.count()).resolves.toBe(1);
    await shot(page, 'mail-inbox-desktop');
    await subject.click();
    await page.getByText('owner.browser@example.test').first().waitFor();
    await shot(page, 'mail-message-desktop');
    const href = await page.getByRole('link', { name: 'bench-report-1.pdf' }).first().getAttribute('href');
    const bytes = Buffer.from(await (await context.request.get(`${inbox}${href}`)).body());
    expect(createHash('sha256').update(bytes).digest('hex')).toBe(createHash('sha256').update(pdf).digest('hex'));
    await page.setViewportSize(PHONE);
    await page.goto(inbox);
    await shot(page, 'mail-inbox-phone');
  });
});
