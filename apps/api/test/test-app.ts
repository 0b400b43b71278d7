import type { NestExpressApplication } from '@nestjs/platform-express';
import { DEMO_PASSWORD } from '@benchproof/seeds';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { createApp } from '../src/app.factory';
import { type AppConfig, loadConfig } from '../src/config';

export interface TestApp {
  app: NestExpressApplication;
  cfg: AppConfig;
  http: () => TestAgent;
  /** A cookie-carrying agent signed in as a demo user, sending the CSRF header on every call. */
  signIn: (email: string) => Promise<SignedIn>;
  close: () => Promise<void>;
}

export interface SignedIn {
  agent: TestAgent;
  csrf: string;
  user: { id: number; shopId: number; role: string };
}

/** A fresh server on a fresh temporary SQLite file with the real migrations and the demo seed. */
export async function startTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-e2e-'));
  const cfg = loadConfig({
    DATABASE_PATH: join(dir, 'test.sqlite'),
    UPLOADS_DIR: join(dir, 'uploads'),
    WEB_DIST: join(dir, 'no-web'),
    LOGIN_THROTTLE_LIMIT: '1000',
    LOGIN_THROTTLE_ADDRESS_LIMIT: '1000',
    MAIL_CATCHER: 'false',
    LOG_LEVEL: 'silent',
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
    close: async () => {
      await app.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
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
