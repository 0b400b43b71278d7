import type { OutboxMessageDto, OwnerLinkDto } from '@benchproof/contracts';
import { sql } from 'drizzle-orm';
import { existsSync, readFileSync } from 'node:fs';
import { startMailCatcher, type MailCatcher } from '../../scripts/mail-catcher.mjs';
import { DB, type Db } from '../../src/core/db';
import { eventually, FakeReportFiles, freePort, makePdf, sha256 } from '../mail/mail-fixtures';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';
import { createLink, ownerPage, ownerScenario } from './owner-helpers';
import { bookIn, driveToReady } from './records-helpers';

const FAST = { MAIL_RETRY_BASE_MS: '200' };
type Caught = ReturnType<MailCatcher['messages']>[number];

/** The owner token in a received e-mail's plain text (`<PUBLIC_URL>/o/<token>`). */
const tokenIn = (mail: Caught): string => /https?:\/\/\S+\/o\/([A-Za-z0-9_-]+\.[A-Za-z0-9_-]+)/.exec(mail.text)?.[1] ?? '';

/** Sends issued report `reportId` of the job and returns the one e-mail the catcher got for it. */
async function sendAndReceive(catcher: MailCatcher, desk: SignedIn, jobId: number, reportId: number, jobNumber: string): Promise<Caught> {
  await desk.agent.post(`/api/jobs/${jobId}/reports/${reportId}/send`).send({}).expect(202);
  const mine = () => catcher.messages().filter((m) => m.subject.includes(jobNumber));
  await eventually(() => Promise.resolve(mine().length ? true : undefined), `the report e-mail of ${jobNumber}`);
  await new Promise((r) => setTimeout(r, 400)); // a second e-mail (the old separate link mail) would arrive by now
  expect(mine()).toHaveLength(1);
  return mine()[0];
}

describe('report e-mail: one message with the PDF and the owner link, worded by the job state', () => {
  let catcher: MailCatcher;
  let t: TestApp;
  let reports: FakeReportFiles;
  let desk: SignedIn;
  let manager: SignedIn;
  let checker: SignedIn;
  beforeAll(async () => {
    catcher = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
    t = await startTestApp({ ...FAST, SMTP_URL: catcher.smtpUrl });
    reports = new FakeReportFiles(t.app);
    [desk, manager, checker] = [await t.signIn(DEMO.desk), await t.signIn(DEMO.manager), await t.signIn(DEMO.mechanic2)];
  });
  afterAll(async () => {
    await t.close();
    await catcher.close();
  });

  it('a finished job: one e-mail with the PDF and a link that opens the owner page; the earlier link is revoked as desk would', async () => {
    const job = await bookIn(desk);
    const earlier = (await desk.agent.post(`/api/jobs/${job.id}/owner-links`).send({ expiresInDays: 7, send: false }).expect(201)).body as { url: string };
    await driveToReady(manager, checker, job.id);
    const pdf = await makePdf(`Bench report ${job.number}`);
    await reports.issue(901, desk.user.shopId, job.id, pdf);
    const before = catcher.messages().length;
    const mail = await sendAndReceive(catcher, desk, job.id, 901, job.number);
    expect(catcher.messages().slice(before)).toHaveLength(1);
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0]).toMatchObject({ contentType: 'application/pdf', sha256: sha256(pdf) });
    expect(mail.text).toContain('We have finished the work');
    const token = tokenIn(mail);
    expect(mail.text).toContain(`${t.cfg.publicUrl}/o/${token}`);
    expect(mail.html).toContain(`href="${t.cfg.publicUrl}/o/${token}"`);
    expect((await ownerPage(t, token)).job.number).toBe(job.number);
    expect(
      (
        await t
          .http()
          .get(`/api/owner/${earlier.url.split('/o/')[1]}`)
          .expect(410)
      ).body.code,
    ).toBe('OWNER_LINK_REVOKED');
    const links = (await desk.agent.get(`/api/jobs/${job.id}/owner-links`).expect(200)).body as OwnerLinkDto[];
    expect(links.filter((l) => l.state === 'active')).toEqual([expect.objectContaining({ sentTo: 'ottilie@example.test' })]);
  });

  it('with items waiting for the owner: asks for the decision, never says the work is finished', async () => {
    const s = await ownerScenario(t);
    const number = (await desk.agent.get(`/api/jobs/${s.jobId}`).expect(200)).body.number as string;
    await reports.issue(902, desk.user.shopId, s.jobId, await makePdf('decision'));
    const mail = await sendAndReceive(catcher, desk, s.jobId, 902, number);
    expect(mail.subject).toMatch(/^Your decision, please/);
    expect(mail.text).toContain('2 items need your decision');
    expect(mail.text).not.toMatch(/finished/i);
    expect(mail.html).toContain('See the items and decide');
    const page = await ownerPage(t, tokenIn(mail));
    expect(page.findings.filter((f) => f.recommendation?.decisionStatus === 'pending')).toHaveLength(2);
  });

  it('work still under way with nothing to decide: neither "finished" nor a decision', async () => {
    const job = await bookIn(desk);
    await manager.agent.post(`/api/jobs/${job.id}/transitions`).send({ to: 'on_stand' }).expect(200);
    await reports.issue(903, desk.user.shopId, job.id, await makePdf('in progress'));
    const mail = await sendAndReceive(catcher, desk, job.id, 903, job.number);
    expect(mail.text).not.toMatch(/finished|your decision/i);
    expect(mail.text).toContain('We will let you know when it is ready to collect');
    expect(mail.attachments).toHaveLength(1);
  });
});

describe('report e-mail over the attachment budget', () => {
  it('goes as the owner link, with no attachment, and the link opens the page', { timeout: 90_000 }, async () => {
    const catcher = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
    const pdf = await makePdf('Large report', 40);
    const t = await startTestApp({ ...FAST, SMTP_URL: catcher.smtpUrl, MAIL_ATTACHMENT_BUDGET: String(pdf.length - 1) });
    try {
      const reports = new FakeReportFiles(t.app);
      const desk = await t.signIn(DEMO.desk);
      const job = await bookIn(desk);
      await reports.issue(601, desk.user.shopId, job.id, pdf);
      const mail = await sendAndReceive(catcher, desk, job.id, 601, job.number);
      expect(mail.attachments).toEqual([]);
      expect(mail.text).toMatch(/larger than the .* MB we attach/);
      expect(mail.text).not.toContain('Ask us');
      const token = tokenIn(mail);
      expect(mail.html).toContain(`href="${t.cfg.publicUrl}/o/${token}"`);
      expect((await ownerPage(t, token)).job.number).toBe(job.number);
    } finally {
      await t.close();
      await catcher.close();
    }
  });
});

describe('no owner secret in clear at rest', () => {
  it(
    'queued mail keeps the link sealed (no row, no database or WAL byte holds it); the e-mail that arrives has a working link',
    { timeout: 90_000 },
    async () => {
      const port = await freePort();
      const t = await startTestApp({ ...FAST, SMTP_URL: `smtp://127.0.0.1:${port}` });
      let catcher: MailCatcher | null = null;
      try {
        const reports = new FakeReportFiles(t.app);
        const desk = await t.signIn(DEMO.desk);
        const linkJob = await bookIn(desk);
        const created = await createLink(desk, linkJob.id); // desk's owner-link e-mail
        const reportJob = await bookIn(desk);
        await reports.issue(951, desk.user.shopId, reportJob.id, await makePdf('sealed'));
        await desk.agent.post(`/api/jobs/${reportJob.id}/reports/951/send`).send({}).expect(202);
        const messages = async (jobId: number) => (await desk.agent.get(`/api/jobs/${jobId}/messages`).expect(200)).body as OutboxMessageDto[];
        await eventually(async () => ((await messages(reportJob.id))[0]?.attempts >= 1 ? true : undefined), 'a failed first attempt');
        expect((await messages(reportJob.id))[0].status).not.toBe('sent');

        const secret = created.token.split('.')[0];
        const db = t.app.get<Db>(DB);
        const tables = db.all<{ name: string }>(sql`SELECT name FROM sqlite_master WHERE type = 'table'`).map((r) => r.name);
        const rowsWith = (needle: string) =>
          tables.filter((name) => db.all(sql.raw(`SELECT * FROM "${name}"`)).some((r) => JSON.stringify(r).includes(needle)));
        const filesWith = (needle: string) =>
          ['', '-wal'].map((x) => `${t.cfg.DATABASE_PATH}${x}`).filter((f) => existsSync(f) && readFileSync(f).includes(needle));
        expect(rowsWith(secret)).toEqual([]);
        expect(filesWith(secret)).toEqual([]);
        expect(rowsWith('/o/')).toEqual([]); // the report e-mail's link too (its token is not known to the test yet)

        catcher = await startMailCatcher({ smtpPort: port, httpPort: 0 });
        const [a, b] = await catcher.waitFor(2, 20_000);
        const byJob = (n: string) => [a, b].find((m) => m.subject.includes(n) || m.text.includes(n));
        expect(byJob(created.url)?.text).toContain(created.url);
        expect((await ownerPage(t, created.token)).job.number).toBe(linkJob.number);
        const reportToken = tokenIn(byJob(reportJob.number) as Caught);
        expect((await ownerPage(t, reportToken)).job.number).toBe(reportJob.number);
        await eventually(async () => ((await messages(reportJob.id))[0]?.status === 'sent' ? true : undefined), 'sent status');
        expect(filesWith(reportToken.split('.')[0])).toEqual([]);
        expect(rowsWith(reportToken.split('.')[0])).toEqual([]);
      } finally {
        await t.close();
        await catcher?.close();
      }
    },
  );
});
