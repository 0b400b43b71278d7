import type { OutboxMessageDto } from '@benchproof/contracts';
import { startMailCatcher, type MailCatcher } from '../../scripts/mail-catcher.mjs';
import { eventually, FakeReportFiles, freePort, makePdf, sha256 } from '../mail/mail-fixtures';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';
import { bookIn, driveToReady } from './records-helpers';

/** Short retry and sweep times so an outage of a second is retried within the test. */
const FAST = { MAIL_RETRY_BASE_MS: '200', MAIL_SWEEP_MS: '100' };

async function appWithReports(env: Record<string, string>) {
  const t = await startTestApp({ ...FAST, ...env });
  const reports = new FakeReportFiles(t.app);
  return { t, reports, desk: await t.signIn(DEMO.desk) };
}

const messages = async (desk: SignedIn, jobId: number) => (await desk.agent.get(`/api/jobs/${jobId}/messages`).expect(200)).body as OutboxMessageDto[];

describe('mail: the report e-mail through real SMTP into the local catcher', () => {
  let catcher: MailCatcher;
  let t: TestApp;
  let reports: FakeReportFiles;
  let desk: SignedIn;
  beforeAll(async () => {
    catcher = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
    ({ t, reports, desk } = await appWithReports({ SMTP_URL: catcher.smtpUrl }));
  });
  afterAll(async () => {
    await t.close();
    await catcher.close();
  });

  it('sends one message to the owner with the issued PDF, byte-identical, and escapes the owner name', async () => {
    const owner = { name: 'Zoë <b>Kowalczyk</b> & Søn', email: 'zoe.k@example.test', phone: null, preferredChannel: 'email', notes: null };
    const job = await bookIn(desk, { newCustomer: owner });
    const pdf = await makePdf(`Bench report ${job.number}`);
    await reports.issue(501, desk.user.shopId, job.id, pdf);
    const before = catcher.messages().length;
    const queued = (await desk.agent.post(`/api/jobs/${job.id}/reports/501/send`).send({}).expect(202)).body as OutboxMessageDto;
    expect(queued.status).toBe('queued');
    const [mail] = (await catcher.waitFor(before + 1)).slice(before);
    expect(mail.envelopeTo).toEqual(['zoe.k@example.test']);
    expect(mail.subject).toContain(job.number);
    expect(mail.messageId).toBe(queued.messageId);
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0]).toMatchObject({ filename: 'bench-report-501.pdf', contentType: 'application/pdf', size: pdf.length, sha256: sha256(pdf) });
    expect(catcher.attachment(mail.id, 0)?.subarray(0, 5).toString()).toBe('%PDF-');
    expect(mail.html).toContain('Zoë &lt;b&gt;Kowalczyk&lt;/b&gt; &amp; Søn');
    expect(mail.html).not.toContain('<b>Kowalczyk');
    expect(mail.text).toContain('Hello Zoë <b>Kowalczyk</b> & Søn,');
    expect(mail.text).toContain('attached');
    const [row] = await eventually(async () => ((await messages(desk, job.id))[0]?.status === 'sent' ? messages(desk, job.id) : undefined), 'sent status');
    expect(row).toMatchObject({ status: 'sent', attempts: 1, to: 'zoe.k@example.test', canResend: false, lastError: null });
    // Nothing else leaves for this job, however long we wait for the relay to sweep again.
    await new Promise((r) => setTimeout(r, 500));
    expect(catcher.messages().filter((m) => m.subject.includes(job.number))).toHaveLength(1);
  });

  it('refuses a report of another job, a mechanic, and an owner with no e-mail', async () => {
    const job = await bookIn(desk);
    const other = await bookIn(desk);
    await reports.issue(502, desk.user.shopId, other.id, await makePdf('other'));
    expect((await desk.agent.post(`/api/jobs/${job.id}/reports/502/send`).send({}).expect(404)).body.code).toBe('NOT_FOUND');
    const mech = await t.signIn(DEMO.mechanic);
    await mech.agent.post(`/api/jobs/${other.id}/reports/502/send`).send({}).expect(403);
    const quiet = await bookIn(desk, { newCustomer: { name: 'Ansel Brook', email: null, phone: '+44 20 7946 0123', preferredChannel: 'phone', notes: null } });
    await reports.issue(503, desk.user.shopId, quiet.id, await makePdf('quiet'));
    const res = await desk.agent.post(`/api/jobs/${quiet.id}/reports/503/send`).send({}).expect(422);
    expect(res.body.code).toBe('NO_OWNER_EMAIL');
    const other2 = await t.signIn(DEMO.otherShopManager);
    await other2.agent.get(`/api/jobs/${job.id}/messages`).expect(404);
  });

  it('asks desk to confirm a hand-over with no report sent, and records that the bike left without one', async () => {
    const manager = await t.signIn(DEMO.manager);
    const checker = await t.signIn(DEMO.mechanic2);
    const drive = (jobId: number) => driveToReady(manager, checker, jobId);
    const bare = await bookIn(desk);
    await drive(bare.id);
    const refused = await desk.agent.post(`/api/jobs/${bare.id}/transitions`).send({ to: 'collected' }).expect(409);
    expect(refused.body.code).toBe('REPORT_NOT_SENT');
    expect((await desk.agent.get(`/api/jobs/${bare.id}`).expect(200)).body.status).toBe('ready');
    const done = (await desk.agent.post(`/api/jobs/${bare.id}/transitions`).send({ to: 'collected', confirmNoReport: true }).expect(200)).body;
    expect(done).toMatchObject({ status: 'collected', collectedWithoutReport: true });
    const events = (await desk.agent.get(`/api/jobs/${bare.id}/events`).expect(200)).body as { to: string; note: string | null }[];
    expect(events.at(-1)).toMatchObject({ to: 'collected', note: 'Handed over without a report' });

    const reported = await bookIn(desk);
    await drive(reported.id);
    await reports.issue(504, desk.user.shopId, reported.id, await makePdf('reported'));
    await desk.agent.post(`/api/jobs/${reported.id}/reports/504/send`).send({}).expect(202);
    const handed = (await desk.agent.post(`/api/jobs/${reported.id}/transitions`).send({ to: 'collected' }).expect(200)).body;
    expect(handed).toMatchObject({ status: 'collected', collectedWithoutReport: false });
  });
});

describe('mail: the outbox through a relay outage', () => {
  it('keeps the message while SMTP is down and delivers it exactly once when it is back', async () => {
    const port = await freePort();
    const { t, reports, desk } = await appWithReports({ SMTP_URL: `smtp://127.0.0.1:${port}` });
    let catcher: MailCatcher | null = null;
    try {
      const job = await bookIn(desk);
      await reports.issue(701, desk.user.shopId, job.id, await makePdf('outage'));
      await desk.agent.post(`/api/jobs/${job.id}/reports/701/send`).send({}).expect(202);
      const failing = await eventually(async () => (await messages(desk, job.id)).find((m) => m.attempts >= 2 && m.lastError), 'two failed attempts');
      expect(failing.status).not.toBe('sent');
      expect(failing.lastError).toMatch(/ECONNREFUSED|connect/i);
      catcher = await startMailCatcher({ smtpPort: port, httpPort: 0 });
      await catcher.waitFor(1);
      const sent = await eventually(async () => (await messages(desk, job.id)).find((m) => m.status === 'sent'), 'sent status');
      expect(sent.attempts).toBeGreaterThanOrEqual(3);
      await new Promise((r) => setTimeout(r, 800));
      expect(catcher.messages()).toHaveLength(1);
      expect(catcher.messages()[0].attachments[0].sha256).toBe(reports.sha256(701));
    } finally {
      await t.close();
      await catcher?.close();
    }
  });

  it('gives up after the last attempt, shows the failure, and a resend delivers it once', async () => {
    const port = await freePort();
    const { t, reports, desk } = await appWithReports({ SMTP_URL: `smtp://127.0.0.1:${port}`, MAIL_MAX_ATTEMPTS: '2' });
    let catcher: MailCatcher | null = null;
    try {
      const job = await bookIn(desk);
      await reports.issue(801, desk.user.shopId, job.id, await makePdf('resend'));
      await desk.agent.post(`/api/jobs/${job.id}/reports/801/send`).send({}).expect(202);
      const failed = await eventually(async () => (await messages(desk, job.id)).find((m) => m.status === 'failed'), 'final failure');
      expect(failed).toMatchObject({ attempts: 2, maxAttempts: 2, canResend: true });
      catcher = await startMailCatcher({ smtpPort: port, httpPort: 0 });
      await new Promise((r) => setTimeout(r, 500));
      expect(catcher.messages()).toHaveLength(0);
      const again = (await desk.agent.post(`/api/jobs/${job.id}/messages/${failed.id}/resend`).expect(200)).body as OutboxMessageDto;
      expect(again.status).toBe('queued');
      await catcher.waitFor(1);
      await eventually(async () => (await messages(desk, job.id)).find((m) => m.status === 'sent'), 'sent after resend');
      const twice = await desk.agent.post(`/api/jobs/${job.id}/messages/${failed.id}/resend`).expect(409);
      expect(twice.body.code).toBe('MESSAGE_NOT_RESENDABLE');
      await new Promise((r) => setTimeout(r, 500));
      expect(catcher.messages()).toHaveLength(1);
      expect(catcher.messages()[0].messageId).toBe(failed.messageId);
    } finally {
      await t.close();
      await catcher?.close();
    }
  });
});
