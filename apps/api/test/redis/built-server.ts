import { type ChildProcess, spawn } from 'node:child_process';
import { join, resolve } from 'node:path';
import { REPO_ROOT } from '../../src/config';
import { freePort } from '../support/redis-server';
import { freshPrefix, REDIS_URL, sleep, until } from './redis-suite';

/** The built API entry (npm run build). */
export const API_ENTRY = resolve(REPO_ROOT, 'dist/apps/api/apps/api/src/main.js');

export interface BuiltServer {
  base: string;
  proc: ChildProcess;
  output: () => string;
  stop: () => Promise<void>;
}

/** The built server as its own process on a free port, ready once /api/health/ready answers 200. */
export async function startBuiltServer(env: Record<string, string>): Promise<BuiltServer> {
  const port = await freePort();
  let out = '';
  const proc = spawn(process.execPath, [API_ENTRY], {
    env: {
      ...process.env,
      PORT: String(port),
      WEB_DIST: join(env.DATABASE_PATH, '..', 'no-web'),
      MAIL_CATCHER: 'false',
      LOG_LEVEL: 'warn',
      LOGIN_THROTTLE_ADDRESS_LIMIT: '1000',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  proc.stdout?.on('data', (d) => (out += String(d)));
  proc.stderr?.on('data', (d) => (out += String(d)));
  const base = `http://127.0.0.1:${port}`;
  await until(
    'readiness',
    async () => {
      if (proc.exitCode !== null) throw new Error(`server exited with ${proc.exitCode}: ${out}`);
      return (await fetch(`${base}/api/health/ready`).catch(() => null))?.ok ? true : undefined;
    },
    120_000,
    200,
  );
  return {
    base,
    proc,
    output: () => out,
    stop: async () => {
      if (proc.exitCode !== null) return;
      const gone = new Promise((r) => proc.once('exit', r));
      proc.kill('SIGTERM');
      await Promise.race([gone, sleep(10_000)]);
    },
  };
}

/** WEB_CONCURRENCY=2 with TASKS=redis on this run's Redis, files under `dir`; resolves once both API processes serve. */
export async function startTwoProcesses(dir: string, env: Record<string, string> = {}): Promise<BuiltServer> {
  const server = await startBuiltServer({
    WEB_CONCURRENCY: '2',
    TASKS: 'redis',
    REDIS_URL: REDIS_URL!,
    REDIS_PREFIX: freshPrefix(),
    DATABASE_PATH: join(dir, 'db.sqlite'),
    UPLOADS_DIR: join(dir, 'uploads'),
    ...env,
  });
  // Ready means the first process answers; the second starts after it (only the first migrates and seeds).
  await until('both processes', () => (server.output().includes('2 API processes serving') ? true : undefined), 180_000, 200);
  return server;
}
