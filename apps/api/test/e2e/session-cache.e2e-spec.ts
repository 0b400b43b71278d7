import { sql } from 'drizzle-orm';
import { DB, type Db } from '../../src/core/db';
import { DEMO, startTestApp, type TestApp } from '../test-app';
import { bearer, changePassword, claimsOf, sessionOf } from '../support/sessions';

const subOf = (jwt: string) => claimsOf(jwt).sub as number;

/**
 * Session lookups are remembered for a few seconds per session id. These checks run inside that window
 * (each warms the cache first) and show that every way a session ends still refuses the very next request.
 */
describe('the session cache never outlives a session', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  const me = (jwt: string) => sessionOf(t, jwt);
  const warm = async (jwt: string) => {
    for (let i = 0; i < 3; i++) await me(jwt).expect(200);
  };

  it('is really in use: a session row removed behind the store’s back still answers within the window', async () => {
    const token = await bearer(t, DEMO.desk);
    await warm(token);
    t.app.get<symbol, Db>(DB).run(sql`delete from sessions where user_id = ${subOf(token)}`);
    // Without the cache this would be 401: the checks below are therefore about the invalidation, not a cache miss.
    await me(token).expect(200);
  });

  it('sign-out ends the cached session at once; another session of the same user lives on', async () => {
    const phone = await bearer(t, DEMO.mechanic);
    const bench = await bearer(t, DEMO.mechanic);
    await warm(phone);
    await warm(bench);
    await t.http().post('/api/auth/logout').set('Authorization', `Bearer ${phone}`).expect(204);
    expect((await me(phone).expect(401)).body.code).toBe('UNAUTHENTICATED');
    await me(bench).expect(200);
  });

  it('deactivation ends every cached session of the user at once', async () => {
    const manager = await t.signIn(DEMO.manager);
    const a = await bearer(t, DEMO.mechanic2);
    const b = await bearer(t, DEMO.mechanic2);
    await warm(a);
    await warm(b);
    await manager.agent
      .patch(`/api/users/${subOf(a)}`)
      .send({ active: false })
      .expect(200);
    await me(a).expect(401);
    await me(b).expect(401);
    await manager.agent
      .patch(`/api/users/${subOf(a)}`)
      .send({ active: true })
      .expect(200);
  });

  it('a password change ends the other cached sessions at once and the new one works', async () => {
    const other = await bearer(t, DEMO.otherShopMechanic);
    const elsewhere = await bearer(t, DEMO.otherShopMechanic);
    await warm(other);
    await warm(elsewhere);
    const fresh = await changePassword(t, other, 'a-new-bench-password');
    await me(other).expect(401);
    await me(elsewhere).expect(401);
    await me(fresh).expect(200);
  });

  it('a role change shows on the next request of a cached session', async () => {
    const manager = await t.signIn(DEMO.manager);
    const token = await bearer(t, DEMO.desk);
    await warm(token);
    await manager.agent
      .patch(`/api/users/${subOf(token)}`)
      .send({ role: 'mechanic' })
      .expect(200);
    expect((await me(token).expect(200)).body.user.role).toBe('mechanic');
    await manager.agent
      .patch(`/api/users/${subOf(token)}`)
      .send({ role: 'desk' })
      .expect(200);
    expect((await me(token).expect(200)).body.user.role).toBe('desk');
  });
});
