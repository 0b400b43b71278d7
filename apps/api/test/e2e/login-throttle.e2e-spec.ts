import { DEMO_PASSWORD } from '@benchproof/seeds';
import { DEMO, startTestApp, type TestApp } from '../test-app';

const WRONG = 'not-the-password';

/** Failed sign-ins are limited per account and per address; forwarded headers count only behind a configured proxy. */
describe('sign-in throttling', () => {
  const apps: TestApp[] = [];
  const start = async (env: Record<string, string>) => {
    const t = await startTestApp({ LOGIN_THROTTLE_WINDOW_SECONDS: '600', ...env });
    apps.push(t);
    return t;
  };
  afterAll(() => Promise.all(apps.map((a) => a.close())));

  const attempt = (t: TestApp, email: string, password: string, forwardedFor?: string) => {
    const req = t.http().post('/api/auth/login');
    if (forwardedFor) req.set('X-Forwarded-For', forwardedFor);
    return req.send({ email, password });
  };

  it('does not count successful sign-ins: a shared front-desk machine is not locked by its own staff', async () => {
    const t = await start({ LOGIN_THROTTLE_LIMIT: '3', LOGIN_THROTTLE_ADDRESS_LIMIT: '3' });
    for (let i = 0; i < 8; i++) await attempt(t, [DEMO.desk, DEMO.mechanic, DEMO.manager][i % 3], DEMO_PASSWORD).expect(200);
  });

  it('locks an account after its failed attempts, with 429 and Retry-After, from any address; other accounts still sign in', async () => {
    const t = await start({ LOGIN_THROTTLE_LIMIT: '3', LOGIN_THROTTLE_ADDRESS_LIMIT: '100', TRUST_PROXY: 'loopback' });
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++) statuses.push((await attempt(t, DEMO.desk, WRONG, `203.0.113.${i + 1}`)).status);
    expect(statuses).toEqual([401, 401, 401]);
    const locked = await attempt(t, DEMO.desk, DEMO_PASSWORD, '198.51.100.7').expect(429);
    expect(locked.body.code).toBe('RATE_LIMITED');
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(locked.headers['retry-after'])).toBeLessThanOrEqual(600);
    await attempt(t, DEMO.mechanic, DEMO_PASSWORD, '203.0.113.1').expect(200);
  });

  it('a success clears the account’s count of earlier typos', async () => {
    const t = await start({ LOGIN_THROTTLE_LIMIT: '3', LOGIN_THROTTLE_ADDRESS_LIMIT: '100' });
    await attempt(t, DEMO.desk, WRONG).expect(401);
    await attempt(t, DEMO.desk, WRONG).expect(401);
    await attempt(t, DEMO.desk, DEMO_PASSWORD).expect(200);
    await attempt(t, DEMO.desk, WRONG).expect(401);
    await attempt(t, DEMO.desk, WRONG).expect(401);
    await attempt(t, DEMO.desk, DEMO_PASSWORD).expect(200);
  });

  it('without TRUST_PROXY ignores X-Forwarded-For: a new forwarded address per try does not get past the address limit', async () => {
    const t = await start({ LOGIN_THROTTLE_LIMIT: '100', LOGIN_THROTTLE_ADDRESS_LIMIT: '4' });
    const emails = ['a@guess.test', 'b@guess.test', 'c@guess.test', 'd@guess.test', 'e@guess.test'];
    const statuses: number[] = [];
    for (const [i, email] of emails.entries()) statuses.push((await attempt(t, email, WRONG, `192.0.2.${i + 10}`)).status);
    expect(statuses).toEqual([401, 401, 401, 401, 429]);
    const res = await attempt(t, DEMO.manager, DEMO_PASSWORD, '192.0.2.99').expect(429);
    expect(res.headers['retry-after']).toBeDefined();
  });

  it('with TRUST_PROXY set, counts each forwarded client address on its own', async () => {
    const t = await start({ LOGIN_THROTTLE_LIMIT: '100', LOGIN_THROTTLE_ADDRESS_LIMIT: '2', TRUST_PROXY: 'loopback' });
    await attempt(t, 'a@guess.test', WRONG, '198.51.100.1').expect(401);
    await attempt(t, 'b@guess.test', WRONG, '198.51.100.1').expect(401);
    await attempt(t, 'c@guess.test', WRONG, '198.51.100.1').expect(429);
    await attempt(t, DEMO.manager, DEMO_PASSWORD, '198.51.100.2').expect(200);
  });
});
