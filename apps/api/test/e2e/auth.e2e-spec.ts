import { JwtService } from '@nestjs/jwt';
import { DEMO, startTestApp, type TestApp } from '../test-app';

describe('sign-in, sessions and CSRF', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('rejects a wrong password with INVALID_CREDENTIALS and sets no cookie', async () => {
    const res = await t.http().post('/api/auth/login').send({ email: DEMO.manager, password: 'wrong-password' }).expect(401);
    expect(res.body.code).toBe('INVALID_CREDENTIALS');
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('rejects a malformed body with VALIDATION_FAILED naming the field', async () => {
    const res = await t.http().post('/api/auth/login').send({ email: 'not-an-email' }).expect(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    expect(res.body.details.issues.map((i: { path: string }) => i.path)).toEqual(expect.arrayContaining(['email', 'password']));
  });

  it('sets an httpOnly session cookie and reports the signed-in user', async () => {
    const res = await t.http().post('/api/auth/login').send({ email: DEMO.desk, password: 'bench-demo-2026' }).expect(200);
    const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
    expect(cookies.find((c) => c.startsWith('bp_session='))).toMatch(/HttpOnly/i);
    expect(cookies.find((c) => c.startsWith('bp_csrf='))).toContain(`bp_csrf=${encodeURIComponent(res.body.csrfToken as string)}`);
    expect(res.body.user).toMatchObject({ email: DEMO.desk, role: 'desk' });
  });

  it('refuses a state change without the CSRF token when the session comes from the cookie', async () => {
    const { agent } = await t.signIn(DEMO.manager);
    const res = await agent.patch('/api/shop/settings').set('x-csrf-token', '').send({ labourRateMinor: 100 }).expect(403);
    expect(res.body.code).toBe('CSRF_MISMATCH');
  });

  it('keeps the CSRF token of the session on a page load, and that token still lets a change through', async () => {
    const { agent, csrf } = await t.signIn(DEMO.manager);
    const again = await agent.get('/api/auth/session').expect(200);
    expect(again.body.csrfToken).toBe(csrf);
    // The browser already holds that token: the page load does not send the cookie again.
    expect(([] as string[]).concat(again.headers['set-cookie'] ?? []).filter((c) => c.startsWith('bp_csrf'))).toEqual([]);
    await agent
      .patch('/api/shop/settings')
      .set('x-csrf-token', again.body.csrfToken as string)
      .send({ labourRateMinor: 4500 })
      .expect(200);
    // A new sign-in is a new session: its token differs, and the first session's token is refused with the new cookie.
    const other = await t.signIn(DEMO.manager);
    expect(other.csrf).not.toBe(csrf);
    const res = await other.agent.patch('/api/shop/settings').set('x-csrf-token', csrf).send({ labourRateMinor: 4600 }).expect(403);
    expect(res.body.code).toBe('CSRF_MISMATCH');
  });

  it('compresses a list over 1 KB for a client that accepts gzip, and sends it plain to one that accepts no encoding', async () => {
    const { agent } = await t.signIn(DEMO.desk);
    const zipped = await agent.get('/api/jobs').set('Accept-Encoding', 'gzip').expect(200);
    expect(zipped.headers['content-encoding']).toBe('gzip');
    const plain = await agent.get('/api/jobs').set('Accept-Encoding', '').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(Number(plain.headers['content-length'])).toBeGreaterThan(1024);
    expect(plain.body.items).toEqual(zipped.body.items);
  });

  it('tells an expired session apart from a missing one', async () => {
    const jwt = t.app.get(JwtService);
    const expired = await jwt.signAsync({ sub: 1, shop: 1, role: 'manager' }, { expiresIn: -10 });
    const res = await t.http().get('/api/users').set('Cookie', `bp_session=${expired}`).expect(401);
    expect(res.body.code).toBe('SESSION_EXPIRED');
  });

  it('sends security headers', async () => {
    const res = await t.http().get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
  });
});
