import type { NestExpressApplication } from '@nestjs/platform-express';
import { DEMO_PASSWORD } from '@benchproof/seeds';
import { mkdirSync, mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { inject } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import { createApp } from '../src/app.factory';
import { type AppConfig, loadConfig } from '../src/config';
import { startS3Fake, type S3Fake } from './support/s3-fake';

export interface TestApp {
  app: NestExpressApplication;
  cfg: AppConfig;
  http: () => TestAgent;
  /** A cookie-carrying agent signed in as a demo user, sending the CSRF header on every call. */
  signIn: (email: string) => Promise<SignedIn>;
  /** Every file the app keeps: local files under UPLOADS_DIR (scratch space, or everything on disk) plus S3 objects, as `/key`. */
  storedFiles: () => string[];
  /** The S3 fake when the suite runs with TEST_STORAGE=s3 (vitest project api-s3), else null. */
  s3: S3Fake | null;
  close: () => Promise<void>;
}

export interface SignedIn {
  agent: TestAgent;
  csrf: string;
  user: { id: number; shopId: number; role: string };
}

/** Whether this run puts media on the S3 fake (TEST_STORAGE=s3, set by the api-s3 vitest project). */
export const ON_S3 = process.env.TEST_STORAGE === 's3';

/** Whether this run puts tasks, live updates and rate limits on Redis (TEST_TASKS=redis, set by the api-redis vitest project). */
export const ON_REDIS = process.env.TEST_TASKS === 'redis';

/** TASKS=redis on the api-redis project's shared Redis, under a key prefix of this app's own (two apps given the same prefix share a queue). */
export function redisEnv(prefix = `t${randomBytes(4).toString('hex')}`): Record<string, string> {
  const url = inject('redisUrl');
  if (!url) throw new Error('api-redis: no redis-server (see the global setup output)');
  return { TASKS: 'redis', REDIS_URL: url, REDIS_PREFIX: prefix };
}

/**
 * A fresh server on a fresh temporary SQLite file with the real migrations and the demo seed;
 * with TEST_STORAGE=s3, its storage is a bucket on an s3rver of its own.
 */
export async function startTestApp(env: Record<string, string> = {}, opts: { s3?: S3Fake } = {}): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-e2e-'));
  // A fake handed in (to outlive this app, e.g. for a restore) is the caller's to close.
  const ownS3 = ON_S3 && !opts.s3 ? await startS3Fake(join(dir, 's3')) : null;
  const s3 = opts.s3 ?? ownS3;
  const cfg = loadConfig({
    ...s3?.env,
    DATABASE_PATH: join(dir, 'test.sqlite'),
    UPLOADS_DIR: join(dir, 'uploads'),
    WEB_DIST: join(dir, 'no-web'),
    LOGIN_THROTTLE_LIMIT: '1000',
    LOGIN_THROTTLE_ADDRESS_LIMIT: '1000',
    MAIL_CATCHER: 'false',
    LOG_LEVEL: 'silent',
    ...(ON_REDIS ? redisEnv() : {}),
    ...env,
  });
  const app = await createApp(cfg, { logger: false });
  await app.init();
  const server = app.getHttpServer();
  return {
    app,
    cfg,
    http: () => request(server),
    signIn: async (email) => {
      const agent = request.agent(server);
      const res = await agent.post('/api/auth/login').send({ email, password: DEMO_PASSWORD }).expect(200);
      const body = res.body as { csrfToken: string; user: SignedIn['user'] };
      agent.set('x-csrf-token', body.csrfToken);
      return { agent, csrf: body.csrfToken, user: body.user };
    },
    storedFiles: () => [...filesUnder(cfg.UPLOADS_DIR), ...(s3?.keys() ?? [])].sort(),
    s3,
    close: async () => {
      await app.close();
      await ownS3?.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** Every regular file under a folder, recursively, as paths relative to it (folders are fine to leave). */
export function filesUnder(dir: string): string[] {
  const out: string[] = [];
  const walk = (d: string) => {
    for (const name of readdirSync(d)) {
      const p = join(d, name);
      if (statSync(p).isDirectory()) walk(p);
      else out.push(p.slice(dir.length));
    }
  };
  mkdirSync(dir, { recursive: true });
  walk(dir);
  return out;
}

/** Demo sign-ins (seeds/src/staff.ts). */
export const DEMO = {
  manager: 'mara@lantern-spoke.test',
  desk: 'desk@lantern-spoke.test',
  mechanic: 'tobin@lantern-spoke.test',
  mechanic2: 'ines@lantern-spoke.test',
  otherShopManager: 'priya@hollow-reed.test',
  otherShopMechanic: 'oskar@hollow-reed.test',
} as const;
