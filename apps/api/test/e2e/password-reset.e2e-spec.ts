import type { MailCatcher } from '../../scripts/mail-catcher.mjs';
import { startAppWithMail, stopAppWithMail } from '../support/app-with-mail';
import { CLOCK, type Clock } from '../../src/core/clock';
import { DEMO, type TestApp } from '../test-app';
import { linkToken, mailTo, newAgent, STRONG, STRONG_2 } from './accounts-helpers';

describe('forgotten passwords through the local mail catcher', () => {
  let t: TestApp;
  let catcher: MailCatcher;
  beforeAll(async () => {
    ({ t, catcher } = await startAppWithMail({ MAIL_SWEEP_MS: '100', RESET_THROTTLE_LIMIT: '3' }));
  });
  afterAll(() => stopAppWithMail(t, catcher));

  it('mails a link that works once, ends every other session and signs in the device that used it', async () => {
    const phone = await t.signIn(DEMO.mechanic);
    const laptop = await t.signIn(DEMO.mechanic);
    const res = await t.http().post('/api/password-resets').send({ email: DEMO.mechanic.toUpperCase() }).expect(202);
    const mail = await mailTo(catcher, DEMO.mechanic, 1);
    expect(mail.text).toContain('30 minutes');
    const token = linkToken(mail.text, '/reset-password');
    const agent = newAgent(t);
    const used = await agent.post('/api/password-resets/use').send({ token, password: STRONG }).expect(200);
    expect(used.body).toMatchObject({ step: 'done', user: { email: DEMO.mechanic } });
    await agent.get('/api/auth/session').expect(200);
    await phone.agent.get('/api/auth/session').expect(401);
    await laptop.agent.get('/api/jobs').expect(401);
    expect((await t.http().post('/api/password-resets/use').send({ token, password: STRONG_2 }).expect(410)).body.code).toBe('LINK_INVALID');
    await t.http().post('/api/auth/login').send({ email: DEMO.mechanic, password: STRONG }).expect(200);
    // An unknown address gets the very same answer, and no mail leaves.
    const unknown = await t.http().post('/api/password-resets').send({ email: 'nobody@lantern-spoke.test' }).expect(202);
    expect(unknown.body).toEqual(res.body);
    await new Promise((r) => setTimeout(r, 600));
    expect(catcher.messages().filter((m) => m.envelopeTo.includes('nobody@lantern-spoke.test'))).toHaveLength(0);
    expect(catcher.messages()).toHaveLength(1);
  });

  it('refuses a link after 30 minutes and a guessable new password; a newer link retires the older one', async () => {
    await t.http().post('/api/password-resets').send({ email: DEMO.desk }).expect(202);
    const older = linkToken((await mailTo(catcher, DEMO.desk, 1)).text, '/reset-password');
    await t.http().post('/api/password-resets').send({ email: DEMO.desk }).expect(202);
    const newer = linkToken((await mailTo(catcher, DEMO.desk, 2)).text, '/reset-password');
    expect((await t.http().post('/api/password-resets/use').send({ token: older, password: STRONG }).expect(410)).body.code).toBe('LINK_INVALID');
    expect((await t.http().post('/api/password-resets/use').send({ token: newer, password: 'lanternspoke1' }).expect(422)).body.code).toBe('WEAK_PASSWORD');
    const clock = t.app.get<Clock>(CLOCK);
    const realNow = clock.now.bind(clock);
    const spy = vi.spyOn(clock, 'now').mockImplementation(() => new Date(realNow().getTime() + 31 * 60e3));
    try {
      expect((await t.http().post('/api/password-resets/use').send({ token: newer, password: STRONG }).expect(410)).body.code).toBe('LINK_EXPIRED');
    } finally {
      spy.mockRestore();
    }
  });

  it('rate-limits requests per typed address, whether or not it has an account', async () => {
    // Limit 3 per address in this app; the desk address used two above.
    await t.http().post('/api/password-resets').send({ email: DEMO.desk }).expect(202);
    const over = await t.http().post('/api/password-resets').send({ email: DEMO.desk }).expect(429);
    expect(over.body.code).toBe('RATE_LIMITED');
    expect(Number(over.headers['retry-after'])).toBeGreaterThan(0);
    for (let i = 0; i < 3; i++) await t.http().post('/api/password-resets').send({ email: 'ghost@lantern-spoke.test' }).expect(202);
    await t.http().post('/api/password-resets').send({ email: 'ghost@lantern-spoke.test' }).expect(429);
  });

  it('lets a manager send a staff member a link, never to another shop', async () => {
    const manager = await t.signIn(DEMO.manager);
    const staff = (await manager.agent.get('/api/users').expect(200)).body as Array<{ id: number; email: string }>;
    const ines = staff.find((u) => u.email === DEMO.mechanic2)!;
    await manager.agent.post(`/api/users/${ines.id}/password-link`).expect(202);
    const mail = await mailTo(catcher, DEMO.mechanic2, 1);
    expect(mail.text).toContain('asked for a password link');
    const mech = await t.signIn(DEMO.mechanic2);
    await mech.agent.post(`/api/users/${ines.id}/password-link`).expect(403);
    const other = await t.signIn(DEMO.otherShopManager);
    await other.agent.post(`/api/users/${ines.id}/password-link`).expect(404);
  });
});
