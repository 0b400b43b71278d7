import type { MailCatcher } from '../../scripts/mail-catcher.mjs';
import { startAppWithMail, stopAppWithMail } from '../support/app-with-mail';
import { SetupCode } from '../../src/setup';
import { startTestApp, type TestApp } from '../test-app';
import { linkToken, mailTo, newAgent, STRONG, withCsrf } from './accounts-helpers';

const SHOP = {
  name: 'Northgate Cycle Works',
  address: '4 Mill Lane',
  phone: '+44 1632 960555',
  email: '',
  currency: 'GBP',
  units: 'metric',
  taxRateBp: 2000,
  labourRateMinor: 6000,
};
const MANAGER = { name: 'Juno Abara', email: 'juno@northgate.test', password: STRONG };

describe('first-run setup on an empty database (SEED_DEMO=false)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ SEED_DEMO: 'false' });
  });
  afterAll(() => t.close());

  it('is open, refuses a wrong code and a guessable password, creates the shop and manager once, then answers 404', async () => {
    expect((await t.http().get('/api/setup').expect(200)).body).toEqual({ setupOpen: true, signupOpen: false });
    // Nobody can sign in on an empty database.
    await t.http().post('/api/auth/login').send({ email: MANAGER.email, password: STRONG }).expect(401);
    const code = t.app.get(SetupCode).current();
    expect(code).toMatch(/^[A-Z2-9]{4}(-[A-Z2-9]{4}){3}$/);
    const wrong = await t.http().post('/api/setup').send({ code: 'AAAA-BBBB-CCCC-DDDD', shop: SHOP, manager: MANAGER }).expect(403);
    expect(wrong.body).toMatchObject({ code: 'SETUP_CODE_INVALID', details: { field: 'code' } });
    const weak = await t
      .http()
      .post('/api/setup')
      .send({ code, shop: SHOP, manager: { ...MANAGER, password: 'Northgate2026' } })
      .expect(422);
    expect(weak.body.code).toBe('WEAK_PASSWORD');
    // Only the locales the settings screen offers (libs/domain SHOP_LOCALES); checked by the contract.
    const badLocale = await t
      .http()
      .post('/api/setup')
      .send({ code, shop: { ...SHOP, locale: 'xx-YY' }, manager: MANAGER })
      .expect(400);
    expect(badLocale.body.details.issues[0].path).toBe('shop.locale');
    expect((await t.http().get('/api/setup').expect(200)).body.setupOpen).toBe(true);

    const agent = newAgent(t);
    // The code is read with dashes and case ignored.
    const made = await agent
      .post('/api/setup')
      // US dates chosen for a pound shop: the choice, not the currency, decides how dates are written.
      .send({ code: code!.toLowerCase().replace(/-/g, ' '), shop: { ...SHOP, locale: 'en-US' }, manager: MANAGER })
      .expect(201);
    expect(made.body).toMatchObject({ step: 'done', user: { email: MANAGER.email, role: 'manager', name: 'Juno Abara' } });
    withCsrf(agent, made.body);
    const settings = (await agent.get('/api/shop/settings').expect(200)).body;
    expect(settings).toMatchObject({
      name: SHOP.name,
      currency: 'GBP',
      taxRateBp: 2000,
      labourRateMinor: 6000,
      requireTwoFactor: false,
      locale: 'en-US',
      dateLocale: 'en-US',
    });

    await t
      .http()
      .post('/api/setup')
      .send({ code, shop: SHOP, manager: { ...MANAGER, email: 'other@northgate.test' } })
      .expect(404);
    expect((await t.http().get('/api/setup').expect(200)).body.setupOpen).toBe(false);
    expect(t.app.get(SetupCode).current()).toBeNull();
    // The manager signs in again with the password they chose.
    await t.http().post('/api/auth/login').send({ email: MANAGER.email, password: STRONG }).expect(200);
  });
});

describe('setup on a server with the demo', () => {
  it('prints no code and has no setup route', async () => {
    const t = await startTestApp();
    try {
      expect(t.app.get(SetupCode).current()).toBeNull();
      expect((await t.http().get('/api/setup').expect(200)).body.setupOpen).toBe(false);
      await t.http().post('/api/setup').send({ code: 'anything-at-all', shop: SHOP, manager: MANAGER }).expect(404);
      await t.http().post('/api/signup').send({ shop: SHOP, manager: MANAGER }).expect(404);
    } finally {
      await t.close();
    }
  });
});

describe('self-service sign-up (SIGNUP=open) with a confirmed e-mail', () => {
  let t: TestApp;
  let catcher: MailCatcher;
  beforeAll(async () => {
    ({ t, catcher } = await startAppWithMail({ SEED_DEMO: 'false', SIGNUP: 'open', SIGNUP_LIMIT: '3', MAIL_SWEEP_MS: '100' }));
  });
  afterAll(() => stopAppWithMail(t, catcher));

  it('opens the workshop only once the link in the e-mail is used, and the link works once', async () => {
    const manager = { name: 'Ola Mensah', email: 'ola@spokehouse.test', password: STRONG };
    const res = await t
      .http()
      .post('/api/signup')
      .send({ shop: { ...SHOP, name: 'Spokehouse' }, manager })
      .expect(202);
    expect(res.body.message).toContain('Check your e-mail');
    await t.http().post('/api/auth/login').send({ email: manager.email, password: STRONG }).expect(401);
    const mail = await mailTo(catcher, manager.email, 1);
    expect(mail.subject).toContain('Spokehouse');
    const token = linkToken(mail.text, '/signup/confirm');
    // The HTML part (react-email) carries the same link on its button.
    expect(mail.html).toContain(`/signup/confirm#${token}"`);
    expect(mail.html).toContain('Confirm my e-mail');
    const agent = newAgent(t);
    const confirmed = await agent.post('/api/signup/confirm').send({ token }).expect(200);
    expect(confirmed.body).toMatchObject({ step: 'done', user: { email: manager.email, role: 'manager' } });
    await agent.get('/api/auth/session').expect(200);
    expect((await t.http().post('/api/signup/confirm').send({ token }).expect(410)).body.code).toBe('LINK_INVALID');
    await t.http().post('/api/auth/login').send({ email: manager.email, password: STRONG }).expect(200);
  });

  it('limits sign-ups per client address', async () => {
    const codes: number[] = [];
    for (let i = 0; i < 3; i++) {
      const r = await t
        .http()
        .post('/api/signup')
        .send({ shop: { ...SHOP, name: `Wheelhouse ${i}` }, manager: { name: 'Rae Okafor', email: `rae${i}@wheelhouse.test`, password: STRONG } });
      codes.push(r.status);
    }
    // The first test used one of the three.
    expect(codes).toEqual([202, 202, 429]);
  });
});
