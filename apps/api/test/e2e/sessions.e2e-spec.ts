import { DEMO_PASSWORD } from '@benchproof/seeds';
import { createHmac } from 'node:crypto';
import { DEMO, startTestApp, type TestApp } from '../test-app';
import { bearer, changePassword, claimsOf, sessionOf } from '../support/sessions';

/** An HS256 JWT (RFC 7519) signed with the server's own secret, built by hand so it can lack `exp`. */
function signHs256(payload: object, secret: string): string {
  const part = (o: object) => Buffer.from(JSON.stringify(o)).toString('base64url');
  const body = `${part({ alg: 'HS256', typ: 'JWT' })}.${part(payload)}`;
  return `${body}.${createHmac('sha256', secret).update(body).digest('base64url')}`;
}

describe('sessions end when they should', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  const me = (jwt: string) => sessionOf(t, jwt);

  it('refuses a token after sign-out, while the same user’s other session lives on', async () => {
    const phone = await bearer(t, DEMO.mechanic);
    const bench = await bearer(t, DEMO.mechanic);
    await me(phone).expect(200);
    await t.http().post('/api/auth/logout').set('Authorization', `Bearer ${phone}`).expect(204);
    expect((await me(phone).expect(401)).body.code).toBe('UNAUTHENTICATED');
    await me(bench).expect(200);
  });

  it('ends a cookie session on sign-out too, so a copied cookie is worthless afterwards', async () => {
    const token = await bearer(t, DEMO.desk);
    const cookie = `bp_session=${token}`;
    await t.http().get('/api/auth/session').set('Cookie', cookie).expect(200);
    await t.http().post('/api/auth/logout').set('Cookie', cookie).expect(204);
    await t.http().get('/api/auth/session').set('Cookie', cookie).expect(401);
  });

  it('refuses tokens of a deactivated user, and re-activation does not bring them back', async () => {
    const manager = await t.signIn(DEMO.manager);
    const token = await bearer(t, DEMO.mechanic2);
    const id = claimsOf(token).sub as number;
    await me(token).expect(200);
    await manager.agent.patch(`/api/users/${id}`).send({ active: false }).expect(200);
    await me(token).expect(401);
    await manager.agent.patch(`/api/users/${id}`).send({ active: true }).expect(200);
    await me(token).expect(401);
    await me(await bearer(t, DEMO.mechanic2)).expect(200);
  });

  it('refuses a correctly signed token that has no expiry', async () => {
    const token = await bearer(t, DEMO.mechanic);
    const { exp: _exp, ...rest } = claimsOf(token);
    const forever = signHs256(rest, t.cfg.jwtSecret);
    await me(token).expect(200);
    expect((await me(forever).expect(401)).body.code).toBe('UNAUTHENTICATED');
    // The same claims with an expiry are accepted, so the refusal is about the missing exp, not the hand signing.
    await me(signHs256({ ...rest, exp: Math.floor(Date.now() / 1000) + 600 }, t.cfg.jwtSecret)).expect(200);
  });

  it('ends every session on a password change; the new password works, the old one does not', async () => {
    const other = await bearer(t, DEMO.otherShopMechanic);
    const elsewhere = await bearer(t, DEMO.otherShopMechanic);
    const fresh = await changePassword(t, other, 'a-new-bench-password');
    await me(other).expect(401);
    await me(elsewhere).expect(401);
    await me(fresh).expect(200);
    await t.http().post('/api/auth/login').send({ email: DEMO.otherShopMechanic, password: DEMO_PASSWORD }).expect(401);
    await me(await bearer(t, DEMO.otherShopMechanic, 'a-new-bench-password')).expect(200);
  });

  it('refuses a password change when the current password is wrong, and keeps the session', async () => {
    const token = await bearer(t, DEMO.desk);
    const res = await t
      .http()
      .post('/api/auth/password')
      .set('Authorization', `Bearer ${token}`)
      .send({ currentPassword: 'not-it', newPassword: 'another-long-one' })
      .expect(401);
    expect(res.body).toMatchObject({ code: 'INVALID_CREDENTIALS', details: { field: 'currentPassword' } });
    await me(token).expect(200);
  });
});
