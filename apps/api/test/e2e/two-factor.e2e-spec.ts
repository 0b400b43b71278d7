import type { RecoveryCodes, TotpEnrolment } from '@benchproof/contracts';
import { DEMO_PASSWORD } from '@benchproof/seeds';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';
import { codeNow, newAgent } from './accounts-helpers';

/** Every operation of the OpenAPI document that needs a session (the route matrix's list). */
async function guardedRoutes(t: TestApp): Promise<Array<{ method: 'get' | 'post' | 'put' | 'patch' | 'delete'; path: string }>> {
  const doc = (await t.http().get('/api/docs-json').expect(200)).body as { paths: Record<string, Record<string, { 'x-public'?: boolean }>> };
  return Object.entries(doc.paths).flatMap(([path, ops]) =>
    Object.entries(ops)
      .filter(([, op]) => op['x-public'] !== true)
      .map(([method]) => ({ method: method as 'get', path: path.replace(/\{[^}]+\}/g, '1') })),
  );
}

const login = (t: TestApp, email: string, password = DEMO_PASSWORD) => t.http().post('/api/auth/login').send({ email, password });

describe('two-step sign-in (TOTP, RFC 6238)', () => {
  let t: TestApp;
  let manager: SignedIn;
  let secret: string;
  let recovery: string[];
  beforeAll(async () => {
    t = await startTestApp({ LOGIN_THROTTLE_LIMIT: '5' });
    manager = await t.signIn(DEMO.manager);
  });
  afterAll(() => t.close());

  it('enrols with a QR code and a first code, and hands out ten recovery codes once', async () => {
    const started = (await manager.agent.post('/api/account/two-factor/start').expect(200)).body as TotpEnrolment;
    expect(started.secret).toMatch(/^[A-Z2-7]{16,}$/);
    expect(started.otpauthUrl).toContain(`secret=${started.secret}`);
    expect(started.qrSvg).toContain('<svg');
    secret = started.secret;
    expect((await manager.agent.post('/api/account/two-factor/confirm').send({ code: '000000' }).expect(401)).body.code).toBe('CODE_INVALID');
    const confirmed = (
      await manager.agent
        .post('/api/account/two-factor/confirm')
        .send({ code: codeNow(secret) })
        .expect(200)
    ).body as RecoveryCodes;
    recovery = confirmed.recoveryCodes;
    expect(new Set(recovery).size).toBe(10);
    expect((await manager.agent.get('/api/account/two-factor').expect(200)).body).toEqual({ enabled: true, requiredByShop: false, recoveryCodesLeft: 10 });
    // Shown once: starting again is refused while it is on.
    await manager.agent.post('/api/account/two-factor/start').expect(409);
  });

  it('asks for the code after the password; the password alone opens nothing', async () => {
    const agent = newAgent(t);
    const first = await agent.post('/api/auth/login').send({ email: DEMO.manager, password: DEMO_PASSWORD }).expect(200);
    expect(first.body).toEqual({ step: 'code', challenge: expect.any(String) });
    expect(first.headers['set-cookie']?.toString() ?? '').not.toContain('bp_session');
    await agent.get('/api/auth/session').expect(401);
    await t.http().get('/api/jobs').set('Authorization', `Bearer ${first.body.challenge}`).expect(401);
    const wrong = await agent.post('/api/auth/login/code').send({ challenge: first.body.challenge, code: '123456' }).expect(401);
    expect(wrong.body.code).toBe('CODE_INVALID');
    // The next step's code (the one used at enrolment is spent), computed here from the secret.
    const code = codeNow(secret, 30);
    const done = await agent.post('/api/auth/login/code').send({ challenge: first.body.challenge, code }).expect(200);
    expect(done.body).toMatchObject({ step: 'done', user: { email: DEMO.manager } });
    await agent.get('/api/auth/session').expect(200);
    // The same code cannot be used twice.
    const again = (await login(t, DEMO.manager).expect(200)).body.challenge as string;
    await t.http().post('/api/auth/login/code').send({ challenge: again, code }).expect(401);
  });

  it('takes a recovery code once', async () => {
    const c1 = (await login(t, DEMO.manager).expect(200)).body.challenge as string;
    await t.http().post('/api/auth/login/code').send({ challenge: c1, code: recovery[0].toUpperCase() }).expect(200);
    const c2 = (await login(t, DEMO.manager).expect(200)).body.challenge as string;
    expect((await t.http().post('/api/auth/login/code').send({ challenge: c2, code: recovery[0] }).expect(401)).body.code).toBe('CODE_INVALID');
    await t.http().post('/api/auth/login/code').send({ challenge: c2, code: recovery[1] }).expect(200);
    expect((await manager.agent.get('/api/account/two-factor').expect(200)).body.recoveryCodesLeft).toBe(8);
  });

  it('limits code attempts like passwords', async () => {
    const c = (await login(t, DEMO.manager).expect(200)).body.challenge as string;
    for (let i = 0; i < 5; i++) await t.http().post('/api/auth/login/code').send({ challenge: c, code: '999999' }).expect(401);
    const limited = await t
      .http()
      .post('/api/auth/login/code')
      .send({ challenge: c, code: codeNow(secret, -30) })
      .expect(429);
    expect(limited.body.code).toBe('RATE_LIMITED');
  });

  it('once the shop requires it, nobody gets past the password without a second factor, through any route', async () => {
    const desk = await t.signIn(DEMO.desk);
    await t.signIn(DEMO.mechanic);
    const required = await manager.agent.put('/api/shop/two-factor').send({ required: true }).expect(200);
    expect(required.body.required).toBe(true);
    // Sessions that never gave a code end at once.
    await desk.agent.get('/api/jobs').expect(401);
    await manager.agent.get('/api/jobs').expect(200);

    const step = (await login(t, DEMO.desk).expect(200)).body as { step: string; challenge: string };
    expect(step.step).toBe('enrol');
    // The challenge is no session: every signed-in route of the OpenAPI document refuses it, as a Bearer token and as the cookie.
    const routes = await guardedRoutes(t);
    expect(routes.length).toBeGreaterThan(50);
    for (const r of routes) {
      const bearer = await t.http()[r.method](r.path).set('Authorization', `Bearer ${step.challenge}`).send({});
      const cookie = await t.http()[r.method](r.path).set('Cookie', `bp_session=${step.challenge}`).send({});
      expect({ route: `${r.method} ${r.path}`, bearer: bearer.status, cookie: cookie.status }).toEqual({
        route: `${r.method} ${r.path}`,
        bearer: 401,
        cookie: 401,
      });
    }
    // Nor does the code step accept an enrolment challenge.
    await t.http().post('/api/auth/login/code').send({ challenge: step.challenge, code: '123456' }).expect(401);

    const enrol = (await t.http().post('/api/auth/login/enrol').send({ challenge: step.challenge }).expect(200)).body as TotpEnrolment;
    const agent = newAgent(t);
    const done = await agent
      .post('/api/auth/login/enrol/confirm')
      .send({ challenge: step.challenge, code: codeNow(enrol.secret) })
      .expect(200);
    expect(done.body).toMatchObject({ step: 'done', user: { email: DEMO.desk }, recoveryCodes: expect.any(Array) });
    expect(done.body.recoveryCodes).toHaveLength(10);
    await agent.get('/api/jobs').expect(200);
    // Next time the desk gives a code.
    expect((await login(t, DEMO.desk).expect(200)).body.step).toBe('code');
    // And cannot turn it off while the shop requires it.
    agent.set('x-csrf-token', done.body.csrfToken);
    expect((await agent.post('/api/account/two-factor/disable').send({ password: DEMO_PASSWORD }).expect(409)).body.code).toBe('TWO_FACTOR_REQUIRED');
  });

  it('lets only a manager with a second factor require it', async () => {
    const other = await t.signIn(DEMO.otherShopManager);
    expect((await other.agent.put('/api/shop/two-factor').send({ required: true }).expect(409)).body.code).toBe('CONFLICT');
    const mech = await t.signIn(DEMO.otherShopMechanic);
    await mech.agent.put('/api/shop/two-factor').send({ required: false }).expect(403);
  });
});
