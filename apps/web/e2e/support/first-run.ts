import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { Page } from 'playwright-core';
import { DESKTOP, PHONE, shot } from './browser';

const root = resolve(import.meta.dirname, '../../../..');

const freePort = () =>
  new Promise<number>((ok, fail) => {
    const srv = createServer();
    srv.once('error', fail);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => ok(port));
    });
  });

/** The local mail catcher (apps/api/scripts/mail-catcher.mjs) as its own process, read through its JSON inbox. */
export interface Inbox {
  url: string;
  smtpUrl: string;
  messages: () => Promise<{ to: string; subject: string; text: string }[]>;
  stop: () => void;
}

async function startInbox(): Promise<Inbox> {
  const [smtpPort, httpPort] = [await freePort(), await freePort()];
  const proc = spawn(process.execPath, [join(root, 'apps/api/scripts/mail-catcher.mjs')], {
    cwd: root,
    env: { ...process.env, MAIL_SMTP_PORT: String(smtpPort), MAIL_HTTP_PORT: String(httpPort) },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  await new Promise<void>((ok, fail) => {
    proc.stdout?.on('data', (d: Buffer) => d.toString().includes('inbox at') && ok());
    proc.once('exit', (code) => fail(new Error(`mail catcher exited ${code}`)));
  });
  const url = `http://127.0.0.1:${httpPort}`;
  return {
    url,
    smtpUrl: `smtp://127.0.0.1:${smtpPort}`,
    messages: async () => (await (await fetch(`${url}/api/messages`)).json()) as { to: string; subject: string; text: string }[],
    stop: () => proc.kill('SIGTERM'),
  };
}

export interface EmptyServer {
  url: string;
  mail: Inbox;
  stop: () => void;
}

/**
 * The built app (npm run build) on an empty database without the demo, its e-mail going to a local
 * catcher, and its links built for the address the browser uses. The suite's shared server has the demo.
 */
export async function emptyServer(setupCode: string, env: Record<string, string> = {}): Promise<EmptyServer> {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-first-run-'));
  const mail = await startInbox();
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const server: ChildProcess = spawn(process.execPath, [join(root, 'dist/apps/api/apps/api/src/main.js')], {
    cwd: root,
    env: {
      ...process.env,
      PORT: String(port),
      PUBLIC_URL: url,
      DATABASE_PATH: join(dir, 'e2e.sqlite'),
      UPLOADS_DIR: join(dir, 'uploads'),
      MAIL_CATCHER: 'false',
      SMTP_URL: mail.smtpUrl,
      SEED_DEMO: 'false',
      SETUP_CODE: setupCode,
      LOG_LEVEL: 'warn',
      ...env,
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  for (let i = 0; i < 150; i++) {
    if (server.exitCode !== null) throw new Error(`Server exited with ${server.exitCode}`);
    const up = await fetch(`${url}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (up) break;
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    url,
    mail,
    stop: () => {
      server.kill('SIGTERM');
      mail.stop();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** The newest caught message to `to` once `count` have arrived (waits up to 20 s); its link (`/join#…`, `/reset-password#…`). */
export async function linkFromMail(mail: Inbox, to: string, path: string, count: number): Promise<{ subject: string; link: string }> {
  let all = await mail.messages();
  for (let i = 0; i < 100 && all.length < count; i++) {
    await new Promise((r) => setTimeout(r, 200));
    all = await mail.messages();
  }
  const msg = all.filter((m) => m.to.includes(to)).at(-1);
  const link = msg?.text.match(new RegExp(`https?://\\S+${path}#[\\w-]+`))?.[0];
  if (!msg || !link) throw new Error(`No ${path} link in the mail to ${to}: ${JSON.stringify(all.map((m) => m.subject))}`);
  return { subject: msg.subject, link };
}

/** One screen at the phone size and at desktop size, then back to the phone. */
export async function shotBoth(page: Page, name: string): Promise<void> {
  await shot(page, `${name}-phone`);
  await page.setViewportSize(DESKTOP);
  await page.waitForTimeout(150);
  await shot(page, `${name}-desktop`);
  await page.setViewportSize(PHONE);
}
