import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { TestProject } from 'vitest/node';

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

/** Boot migrates and seeds the demo shop with its photos: on a busy machine that has taken over 30 s. */
const BOOT_WAIT_MS = 120_000;

async function waitForHealth(url: string, server: ChildProcess): Promise<void> {
  const until = Date.now() + BOOT_WAIT_MS;
  while (Date.now() < until) {
    if (server.exitCode !== null) throw new Error(`Server exited with ${server.exitCode}`);
    const ok = await fetch(`${url}/api/health`)
      .then((r) => r.ok)
      .catch(() => false);
    if (ok) return;
    await new Promise((r) => setTimeout(r, 200));
  }
  // Without this the server outlives the failed run and holds vitest's output open.
  server.kill('SIGTERM');
  throw new Error(`Server did not become healthy in ${BOOT_WAIT_MS / 1000} s`);
}

/** Starts the BUILT app (npm run build first) on a free port with a fresh seeded database. */
export default async function setup(project: TestProject) {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-browser-'));
  const port = await freePort();
  const server = spawn(process.execPath, [join(root, 'dist/apps/api/apps/api/src/main.js')], {
    cwd: root,
    env: {
      ...process.env,
      PORT: String(port),
      DATABASE_PATH: join(dir, 'e2e.sqlite'),
      UPLOADS_DIR: join(dir, 'uploads'),
      MAIL_CATCHER: 'false',
      LOGIN_THROTTLE_LIMIT: '1000',
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const baseURL = `http://127.0.0.1:${port}`;
  await waitForHealth(baseURL, server);
  project.provide('baseURL', baseURL);
  project.provide('sessionSecretFile', join(dir, '.session-secret'));
  return () => {
    server.kill('SIGTERM');
    rmSync(dir, { recursive: true, force: true });
  };
}

declare module 'vitest' {
  export interface ProvidedContext {
    baseURL: string;
    sessionSecretFile: string;
  }
}
