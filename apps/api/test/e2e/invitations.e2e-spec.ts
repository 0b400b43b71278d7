import type { InvitationDto } from '@benchproof/contracts';
import type { MailCatcher } from '../../scripts/mail-catcher.mjs';
import { startAppWithMail, stopAppWithMail } from '../support/app-with-mail';
import { CLOCK, type Clock } from '../../src/core/clock';
import { DEMO, type SignedIn, type TestApp } from '../test-app';
import { linkToken, mailTo, newAgent, STRONG } from './accounts-helpers';

describe('invitations by e-mail', () => {
  let t: TestApp;
  let catcher: MailCatcher;
  let manager: SignedIn;
  beforeAll(async () => {
    ({ t, catcher } = await startAppWithMail({ MAIL_SWEEP_MS: '100' }));
    manager = await t.signIn(DEMO.manager);
  });
  afterAll(() => stopAppWithMail(t, catcher));

  const invite = async (name: string, email: string, role = 'mechanic') => {
    const res = await manager.agent.post('/api/invitations').send({ name, email, role }).expect(201);
    const mail = await mailTo(catcher, email, 1);
    return { invitation: res.body as InvitationDto, token: linkToken(mail.text, '/join'), mail };
  };

  it('lets the invited mechanic choose a password and sign in; the link then stops working', async () => {
    const { invitation, token, mail } = await invite('Sol Brennan', 'sol@lantern-spoke.test');
    expect(mail.subject).toContain('BenchProof');
    expect(mail.text).toContain('choose your own password');
    const pending = (await manager.agent.get('/api/invitations').expect(200)).body as InvitationDto[];
    expect(pending.map((i) => i.email)).toContain('sol@lantern-spoke.test');
    expect(invitation).toMatchObject({ role: 'mechanic', expired: false });
    expect(new Date(invitation.expiresAt).getTime() - new Date(invitation.sentAt).getTime()).toBe(7 * 24 * 3600e3);

    expect((await t.http().post('/api/invitations/preview').send({ token }).expect(200)).body).toMatchObject({ name: 'Sol Brennan', role: 'mechanic' });
    const weak = await t.http().post('/api/invitations/accept').send({ token, password: 'password12345' }).expect(422);
    expect(weak.body.code).toBe('WEAK_PASSWORD');
    const agent = newAgent(t);
    const accepted = await agent.post('/api/invitations/accept').send({ token, password: STRONG }).expect(200);
    expect(accepted.body).toMatchObject({ step: 'done', user: { email: 'sol@lantern-spoke.test', role: 'mechanic' } });
    await agent.get('/api/auth/session').expect(200);
    await t.http().post('/api/auth/login').send({ email: 'sol@lantern-spoke.test', password: STRONG }).expect(200);
    // Reused: refused, and no second account.
    expect((await t.http().post('/api/invitations/accept').send({ token, password: STRONG }).expect(410)).body.code).toBe('LINK_INVALID');
    const after = (await manager.agent.get('/api/invitations').expect(200)).body as InvitationDto[];
    expect(after.map((i) => i.email)).not.toContain('sol@lantern-spoke.test');
    const users = (await manager.agent.get('/api/users').expect(200)).body as Array<{ email: string }>;
    expect(users.filter((u) => u.email === 'sol@lantern-spoke.test')).toHaveLength(1);
  });

  it('refuses a withdrawn link; a resent one replaces the old link', async () => {
    const first = await invite('Kit Arden', 'kit@lantern-spoke.test', 'desk');
    const again = await manager.agent.post(`/api/invitations/${first.invitation.id}/resend`).expect(200);
    const second = linkToken((await mailTo(catcher, 'kit@lantern-spoke.test', 2)).text, '/join');
    expect(second).not.toBe(first.token);
    expect(new Date((again.body as InvitationDto).sentAt).getTime()).toBeGreaterThanOrEqual(new Date(first.invitation.sentAt).getTime());
    expect((await t.http().post('/api/invitations/preview').send({ token: first.token }).expect(410)).body.code).toBe('LINK_INVALID');
    await manager.agent.delete(`/api/invitations/${first.invitation.id}`).expect(204);
    expect((await t.http().post('/api/invitations/accept').send({ token: second, password: STRONG }).expect(410)).body.code).toBe('LINK_INVALID');
    await t.http().post('/api/auth/login').send({ email: 'kit@lantern-spoke.test', password: STRONG }).expect(401);
  });

  it('refuses an expired link (after 7 days)', async () => {
    const { token } = await invite('Lee Varga', 'lee@lantern-spoke.test');
    const clock = t.app.get<Clock>(CLOCK);
    const realNow = clock.now.bind(clock);
    const spy = vi.spyOn(clock, 'now').mockImplementation(() => new Date(realNow().getTime() + 7 * 24 * 3600e3 + 1000));
    try {
      expect((await t.http().post('/api/invitations/accept').send({ token, password: STRONG }).expect(410)).body.code).toBe('LINK_EXPIRED');
    } finally {
      spy.mockRestore();
    }
    const list = (await manager.agent.get('/api/invitations').expect(200)).body as InvitationDto[];
    expect(list.find((i) => i.email === 'lee@lantern-spoke.test')?.expired).toBe(false);
  });

  it('is for managers only, scoped to their shop, and refuses an address that already has an account', async () => {
    const desk = await t.signIn(DEMO.desk);
    await desk.agent.post('/api/invitations').send({ name: 'X', email: 'x@lantern-spoke.test', role: 'desk' }).expect(403);
    expect((await manager.agent.post('/api/invitations').send({ name: 'Dup', email: DEMO.mechanic, role: 'desk' }).expect(409)).body.code).toBe('EMAIL_TAKEN');
    const other = await t.signIn(DEMO.otherShopManager);
    const mine = (await manager.agent.get('/api/invitations').expect(200)).body as InvitationDto[];
    await other.agent.delete(`/api/invitations/${mine[0].id}`).expect(404);
    expect((await other.agent.get('/api/invitations').expect(200)).body).toEqual([]);
    // Nobody types a password for someone else: the old route is gone.
    await manager.agent.post('/api/users').send({ name: 'P', email: 'p@lantern-spoke.test', role: 'desk', password: STRONG }).expect(404);
  });
});
