import { DEMO_PASSWORD } from '@benchproof/seeds';
import type { OwnerPageDto } from '@benchproof/contracts';
import { Redis } from 'ioredis';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { bookIn } from '../e2e/records-helpers';
import { seen } from '../e2e/owner-helpers';
import type { SignedIn } from '../test-app';
import { DEMO } from '../test-app';
import { describeRedis, freshPrefix, REDIS_URL, until } from './redis-suite';
import { type BuiltServer, startBuiltServer } from './built-server';

/** A cookie session made with fetch (for a stream, or to use on the other process). */
async function cookieSession(base: string, email: string, password = DEMO_PASSWORD): Promise<{ cookie: string; csrf: string }> {
  const res = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200) throw new Error(`sign-in ${res.status}`);
  const cookie = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  return { cookie, csrf: ((await res.json()) as { csrfToken: string }).csrfToken };
}

async function signIn(base: string, email: string): Promise<SignedIn> {
  const agent = request.agent(base);
  const body = (await agent.post('/api/auth/login').send({ email, password: DEMO_PASSWORD }).expect(200)).body as { csrfToken: string; user: SignedIn['user'] };
  agent.set('x-csrf-token', body.csrfToken);
  return { agent, csrf: body.csrfToken, user: body.user };
}

/** A job waiting on the owner with one priced recommendation, and a link to it (not e-mailed). */
async function waitingOnOwner(base: string) {
  const desk = await signIn(base, DEMO.desk);
  const mech = await signIn(base, DEMO.mechanic);
  const job = await bookIn(desk);
  const j = `/api/jobs/${job.id}`;
  await desk.agent.post(`${j}/transitions`).send({ to: 'on_stand' }).expect(200);
  const finding = (await mech.agent.post(`${j}/findings`).send({ area: 'drivetrain', condition: 'worn', description: 'Chain past its wear limit' }).expect(201))
    .body as { id: number };
  const rec = (
    await desk.agent
      .post(`${j}/findings/${finding.id}/recommendation`)
      .send({ summary: 'New chain', parts: [{ description: 'Chain 11-speed', qty: 1, unitPriceMinor: 3500 }], labourHundredths: 25 })
      .expect(201)
  ).body as { id: number };
  await desk.agent.post(`${j}/transitions`).send({ to: 'waiting_owner' }).expect(200);
  const link = (await desk.agent.post(`${j}/owner-links`).send({ expiresInDays: 7, send: false }).expect(201)).body as { url: string };
  return { jobId: job.id, shopId: desk.user.shopId, recId: rec.id, token: link.url.split('/o/')[1] };
}

// Two API processes (the built server, as `npm start` runs it) on one SQLite file and one Redis:
// what one process does, staff on the other see; limits count once for both.
describeRedis('two API processes on one database and one Redis', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-2srv-'));
  const prefix = freshPrefix();
  let a: BuiltServer;
  let b: BuiltServer;
  let redis: Redis;
  beforeAll(async () => {
    const env = {
      DATABASE_PATH: join(dir, 'db.sqlite'),
      UPLOADS_DIR: join(dir, 'uploads'),
      TASKS: 'redis',
      REDIS_URL: REDIS_URL!,
      REDIS_PREFIX: prefix,
      LOGIN_THROTTLE_LIMIT: '3',
    };
    a = await startBuiltServer(env);
    b = await startBuiltServer(env);
    redis = new Redis(REDIS_URL!);
  });
  afterAll(async () => {
    await Promise.all([a?.stop(), b?.stop()]);
    await redis?.quit();
    rmSync(dir, { recursive: true, force: true });
  });

  it('both report tasks on Redis', async () => {
    for (const s of [a, b]) {
      const ready = (await fetch(`${s.base}/api/health/ready`).then((r) => r.json())) as { checks: { tasks: { driver: string; ok: boolean } } };
      expect(ready.checks.tasks).toMatchObject({ ok: true, driver: 'redis' });
    }
  });

  it('an owner decision taken through one process reaches a staff live stream held open on the other', async () => {
    const s = await waitingOnOwner(a.base);
    const staff = await cookieSession(b.base, DEMO.desk);
    const stream = new AbortController();
    const res = await fetch(`${b.base}/api/jobs/${s.jobId}/owner-events`, { headers: { cookie: staff.cookie }, signal: stream.signal });
    expect(res.status).toBe(200);
    const reader = res.body!.getReader();
    let received = '';
    const reading = (async () => {
      for (let r = await reader.read(); !r.done; r = await reader.read()) received += Buffer.from(r.value).toString('utf8');
    })().catch(() => undefined);
    const channel = `${prefix}:live:owner:${s.shopId}:${s.jobId}`;
    await until('the stream on B to subscribe', async () => (((await redis.pubsub('NUMSUB', channel)) as [string, number])[1] >= 1 ? true : undefined));

    const page = (await request(a.base).get(`/api/owner/${s.token}`).expect(200)).body as OwnerPageDto;
    await request(a.base)
      .post(`/api/owner/${s.token}/decisions`)
      .send({ items: [{ ...seen(page, s.recId), status: 'approved' }] })
      .expect(200);
    await until('the decision on the stream', () => (received.includes('"decided"') ? true : undefined), 10_000);
    expect(received).toMatch(new RegExp(`"type":"decided","jobId":${s.jobId}`));
    stream.abort();
    await reading;
  });

  it('counts failed sign-ins of an account once across both processes (LOGIN_THROTTLE_LIMIT=3)', async () => {
    const wrong = { email: DEMO.mechanic2, password: 'not the password' };
    await request(a.base).post('/api/auth/login').send(wrong).expect(401);
    await request(b.base).post('/api/auth/login').send(wrong).expect(401);
    await request(a.base).post('/api/auth/login').send(wrong).expect(401);
    // Each process alone has seen fewer than 3; together they have seen 3, so the right password waits too.
    const res = await request(b.base).post('/api/auth/login').send({ email: DEMO.mechanic2, password: DEMO_PASSWORD }).expect(429);
    expect(res.body.code).toBe('RATE_LIMITED');
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('shares the public verify budget (30 a minute per client) between the processes', async () => {
    const hash = '0'.repeat(64);
    const statuses: number[] = [];
    for (let i = 0; i < 30; i++) statuses.push((await request(i % 2 ? b.base : a.base).get(`/api/verify/${hash}`)).status);
    expect(statuses.filter((st) => st === 429)).toEqual([]);
    await request(b.base).get(`/api/verify/${hash}`).expect(429);
  });

  it('a sign-out on one process is refused on the other at once (its session cache forgets through Redis)', async () => {
    const s = await cookieSession(a.base, DEMO.manager);
    await request(b.base).get('/api/auth/session').set('cookie', s.cookie).expect(200);
    await request(a.base).post('/api/auth/logout').set('cookie', s.cookie).set('x-csrf-token', s.csrf).expect(204);
    // B cached the session for 5 s; the broadcast makes it ask the database again well before that.
    const started = Date.now();
    await until(
      'B to refuse the ended session',
      async () => ((await request(b.base).get('/api/auth/session').set('cookie', s.cookie)).status === 401 ? true : undefined),
      2000,
      20,
    );
    expect(Date.now() - started).toBeLessThan(2000);
  });
});
