import { DEMO, startTestApp, type TestApp } from '../test-app';

describe('users admin and shop isolation', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  // New staff arrive by invitation and choose their own password: invitations.e2e-spec.ts.

  it('will not demote or deactivate the last active manager', async () => {
    const { agent, user } = await t.signIn(DEMO.manager);
    expect((await agent.patch(`/api/users/${user.id}`).send({ role: 'desk' }).expect(409)).body.code).toBe('LAST_MANAGER');
    expect((await agent.patch(`/api/users/${user.id}`).send({ active: false }).expect(409)).body.code).toBe('LAST_MANAGER');
  });

  it('cuts off a deactivated user at their next request', async () => {
    const manager = await t.signIn(DEMO.manager);
    const mech = await t.signIn(DEMO.mechanic2);
    await mech.agent.get('/api/users').expect(200);
    await manager.agent.patch(`/api/users/${mech.user.id}`).send({ active: false }).expect(200);
    await mech.agent.get('/api/users').expect(401);
  });

  it('keeps each shop to its own staff: another shop sees 404 and no names', async () => {
    const own = await t.signIn(DEMO.manager);
    const other = await t.signIn(DEMO.otherShopManager);
    const list = (await other.agent.get('/api/users').expect(200)).body as { email: string }[];
    expect(list.every((u) => u.email.endsWith('@hollow-reed.test'))).toBe(true);
    const res = await other.agent.patch(`/api/users/${own.user.id}`).send({ role: 'desk' }).expect(404);
    expect(res.body.code).toBe('NOT_FOUND');
  });
});
