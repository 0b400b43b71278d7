import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { Page } from 'playwright-core';
import { startMailCatcher, type MailCatcher } from '../../../api/scripts/mail-catcher.mjs';
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

export interface EmptyServer {
  url: string;
  mail: MailCatcher;
  stop: () => Promise<void>;
}

/**
 * The built app (npm run build) on an empty database without the demo, its e-mail going to a local
 * catcher, and its links built for the address the browser uses. The suite's shared server has the demo.
 */
export async function emptyServer(setupCode: string, env: Record<string, string> = {}): Promise<EmptyServer> {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-first-run-'));
  const mail = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
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
    stop: async () => {
      server.kill('SIGTERM');
      await mail.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** The newest caught message to `to`, waiting for it; its link (`/join#…`, `/reset-password#…`) is returned. */
export async function linkFromMail(mail: MailCatcher, to: string, path: string, count: number): Promise<{ subject: string; link: string }> {
  await mail.waitFor(count, 20_000);
  const msg = mail
    .messages()
    .filter((m) => m.to.includes(to))
    .at(-1);
  const link = msg?.text.match(new RegExp(`https?://\\S+${path}#[\\w-]+`))?.[0];
  if (!msg || !link) throw new Error(`No ${path} link in the mail to ${to}: ${JSON.stringify(mail.messages().map((m) => m.subject))}`);
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
