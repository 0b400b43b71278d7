import { FINAL_CHECK_ITEMS } from '@benchproof/domain';
import type { MailCatcher } from '../../scripts/mail-catcher.mjs';
import { emailKitLoaded } from '../../src/mail/templates/email-kit';
import { makePdf, FakeReportFiles } from '../mail/mail-fixtures';
import { startAppWithMail, stopAppWithMail } from '../support/app-with-mail';
import { DEMO, type SignedIn, type TestApp } from '../test-app';
import { mailTo } from './accounts-helpers';
import { bookIn } from './records-helpers';

/** A name with every character HTML gives meaning to. */
const TRICKY = `Rosa O'Dell <b>&</b> "Sons"`;
/** How it must appear in the HTML part: escaped, as React writes text (react-dom escapeTextForBrowser). */
const TRICKY_HTML = 'Rosa O&#x27;Dell &lt;b&gt;&amp;&lt;/b&gt; &quot;Sons&quot;';

type Caught = Awaited<ReturnType<typeof mailTo>>;
const htmlOf = (mail: Caught): string => mail.html ?? '';

/** Both parts there; the link is the button's target in the HTML (with & escaped) and written out in the text. */
function expectLinkInBothParts(mail: Caught, link: string): void {
  expect(mail.text.trim().length).toBeGreaterThan(0);
  expect(mail.text).toContain(link);
  expect(htmlOf(mail)).toContain(`href="${link.replaceAll('&', '&amp;')}"`);
  expect(htmlOf(mail).startsWith('<!DOCTYPE html>')).toBe(true);
}

function expectEscapedName(mail: Caught): void {
  expect(htmlOf(mail)).toContain(TRICKY_HTML);
  expect(htmlOf(mail)).not.toContain('<b>&</b>');
  expect(mail.text).toContain(`Hello ${TRICKY},`);
}

const linkIn = (text: string, path: string): string => {
  const m = new RegExp(`https?://\\S+${path}\\S*`).exec(text);
  if (!m) throw new Error(`No ${path} link in:\n${text}`);
  return m[0];
};

describe('every kind of e-mail, rendered with react-email and caught over real SMTP', () => {
  let t: TestApp;
  let catcher: MailCatcher;
  let desk: SignedIn;
  let owner: { name: string; email: string; phone: null; preferredChannel: 'email'; notes: null };
  beforeAll(async () => {
    ({ t, catcher } = await startAppWithMail({ MAIL_SWEEP_MS: '100' }));
    desk = await t.signIn(DEMO.desk);
  });
  afterAll(() => stopAppWithMail(t, catcher));
  let n = 0;
  beforeEach(() => {
    n += 1;
    owner = { name: TRICKY, email: `rosa${n}@example.test`, phone: null, preferredChannel: 'email', notes: null };
  });

  it('starts without loading the e-mail renderer (react-dom/server and the components come with the first message)', () => {
    expect(emailKitLoaded()).toBe(false);
  });

  it('the owner link ("your estimate needs your decision") carries the link the API answered', async () => {
    const job = await bookIn(desk, { newCustomer: owner });
    const created = (await desk.agent.post(`/api/jobs/${job.id}/owner-links`).send({ expiresInDays: 7, send: true }).expect(201)).body as { url: string };
    const mail = await mailTo(catcher, owner.email, 1);
    expectLinkInBothParts(mail, created.url);
    expectEscapedName(mail);
    expect(htmlOf(mail)).toContain('See the estimate and decide');
  });

  it('the report e-mail carries the owner page link and says the PDF is attached', async () => {
    const job = await bookIn(desk, { newCustomer: owner });
    await new FakeReportFiles(t.app).issue(701, desk.user.shopId, job.id, await makePdf(`Bench report ${job.number}`));
    await desk.agent.post(`/api/jobs/${job.id}/reports/701/send`).send({}).expect(202);
    const mail = await mailTo(catcher, owner.email, 1);
    expectLinkInBothParts(mail, linkIn(mail.text, '/o/'));
    expectEscapedName(mail);
    expect(htmlOf(mail)).toContain('The report is attached to this e-mail as a PDF.');
    expect(htmlOf(mail)).toContain(`Job ${job.number}`);
  });

  it('the receipt carries the amounts paid (30 min at the demo 60.00/h + 20 % tax = 36.00)', async () => {
    const mech = await t.signIn(DEMO.mechanic);
    const checker = await t.signIn(DEMO.mechanic2);
    const job = await bookIn(desk, { newCustomer: owner, mechanicId: mech.user.id });
    const j = `/api/jobs/${job.id}`;
    for (const to of ['on_stand', 'in_work']) await desk.agent.post(`${j}/transitions`).send({ to }).expect(200);
    await mech.agent.post(`${j}/work-entries`).send({ description: 'Trued both wheels', minutes: 30, chargeable: true }).expect(201);
    await desk.agent.post(`${j}/transitions`).send({ to: 'final_check' }).expect(200);
    const items = Object.fromEntries(FINAL_CHECK_ITEMS.map((i) => [i, true]));
    await checker.agent.post(`${j}/final-check`).send({ items, passed: true, testRideNotes: null, note: null }).expect(201);
    await desk.agent.post(`${j}/transitions`).send({ to: 'ready' }).expect(200);
    await desk.agent.post(`${j}/payments`).send({ method: 'cash', amountMinor: 3600 }).expect(201);
    const mail = await mailTo(catcher, owner.email, 1);
    expect(mail.subject).toBe(`Receipt: job ${job.number} paid in full`);
    expectEscapedName(mail);
    for (const amount of ['30.00', '6.00', '36.00']) {
      expect(htmlOf(mail)).toContain(amount);
      expect(mail.text).toContain(amount);
    }
    expect(mail.text).toContain('Keep this e-mail as your receipt.');
  });

  it('the invitation and the password link carry their one-use links, with the person named safely', async () => {
    const manager = await t.signIn(DEMO.manager);
    await manager.agent.post('/api/invitations').send({ name: TRICKY, email: 'rosa.staff@lantern-spoke.test', role: 'mechanic' }).expect(201);
    const invitation = await mailTo(catcher, 'rosa.staff@lantern-spoke.test', 1);
    expectLinkInBothParts(invitation, linkIn(invitation.text, '/join#'));
    expectEscapedName(invitation);

    await t.http().post('/api/password-resets').send({ email: DEMO.mechanic }).expect(202);
    const reset = await mailTo(catcher, DEMO.mechanic, 1);
    expectLinkInBothParts(reset, linkIn(reset.text, '/reset-password#'));
    expect(htmlOf(reset)).toContain('Set a new password');
  });
});
