import type { FindingDto } from '@benchproof/contracts';
import { sql } from 'drizzle-orm';
import { createHash } from 'node:crypto';
import { DB, type Db } from '../../src/core/db';
import { outboxMessages, ownerLinks } from '../../src/db/schema';
import type { AuthUser } from '../../src/core/auth';
import { CLOCK, type Clock } from '../../src/core/clock';
import { OwnerLinksService } from '../../src/owner-links';
import type { MailCatcher } from '../../scripts/mail-catcher.mjs';
import { startAppWithMail, stopAppWithMail } from '../support/app-with-mail';
import { eventually } from '../mail/mail-fixtures';
import { derivativesSettled, solidJpeg } from '../media/media-fixtures';
import type { TestApp } from '../test-app';
import { createLink, ownerPage, ownerScenario, seen, type OwnerScenario } from './owner-helpers';

describe('owner link', () => {
  let t: TestApp;
  let s: OwnerScenario;
  let other: OwnerScenario;
  let catcher: MailCatcher;
  beforeAll(async () => {
    ({ t, catcher } = await startAppWithMail({ MAIL_SWEEP_MS: '100' }));
    s = await ownerScenario(t);
    other = await ownerScenario(t);
  });
  afterAll(() => stopAppWithMail(t, catcher));

  it('is returned once as a URL and stored only as a SHA-256 hash', async () => {
    const created = await createLink(s.desk, s.jobId);
    expect(created.url).toMatch(/\/o\/[A-Za-z0-9_-]{43}\.[A-Za-z0-9_-]{22}$/);
    expect(created.link).toMatchObject({ state: 'active', jobId: s.jobId });
    expect(created.mail).toEqual({ status: 'queued', reason: null, channel: 'email' });
    expect(created.link.sentTo).toBe('ottilie@example.test');
    const rows = t.app.get<Db>(DB).select().from(ownerLinks).all();
    const row = rows.find((r) => r.id === created.link.id);
    expect(row?.tokenHash).toBe(createHash('sha256').update(created.token).digest('hex'));
    // Nor does any other column of the link rows hold the secret half of the token.
    const secret = created.token.split('.')[0];
    expect(
      t.app
        .get<Db>(DB)
        .select()
        .from(ownerLinks)
        .all()
        .some((r) => JSON.stringify(r).includes(secret)),
    ).toBe(false);
    const listed = (await s.desk.agent.get(`/api/jobs/${s.jobId}/owner-links`).expect(200)).body as { expiresAt: string }[];
    expect(new Date(listed[0].expiresAt).getTime()).toBeGreaterThan(Date.now() + 6 * 24 * 3600e3);
  });

  it('e-mails the owner the link once, through the outbox, as the estimate to decide on', async () => {
    const created = await createLink(s.desk, s.jobId);
    const mine = () => catcher.messages().filter((m) => m.text.includes(created.url));
    await eventually(() => Promise.resolve(mine().length ? true : undefined), 'the owner-link e-mail');
    await new Promise((r) => setTimeout(r, 300));
    expect(mine()).toHaveLength(1);
    expect(mine()[0].envelopeTo).toEqual(['ottilie@example.test']);
    const messages = (await s.desk.agent.get(`/api/jobs/${s.jobId}/messages`).expect(200)).body as { id: number; kind: string; status: string }[];
    expect(messages[0]).toMatchObject({ kind: 'estimate_decision', status: 'sent' });
  });

  it('keeps no copy of the link once the e-mail is sent; the link the owner received still opens the page', async () => {
    const created = await createLink(s.desk, s.jobId);
    const received = await eventually(() => Promise.resolve(catcher.messages().find((m) => m.text.includes(created.url))), 'the owner-link e-mail');
    const db = t.app.get<Db>(DB);
    const row = await eventually(
      () =>
        Promise.resolve(
          db
            .select()
            .from(outboxMessages)
            .all()
            .find((m) => m.messageId === received.messageId && m.status === 'sent'),
        ),
      'the outbox row marked sent',
    );
    // What audit needs stays: recipient, subject, Message-ID, sent time; the wording keeps a marker where the link stood.
    expect(row).toMatchObject({ kind: 'estimate_decision', toAddress: 'ottilie@example.test', subject: received.subject });
    expect(row.sentAt?.getTime()).toBeGreaterThan(0);
    expect(row.textBody).toContain('[link removed after sending]');
    expect(row.htmlBody).toContain('[link removed after sending]');
    // No table of the database holds the secret half of the token now (the link table keeps only its SHA-256).
    const secret = created.token.split('.')[0];
    const tables = db.all<{ name: string }>(sql`SELECT name FROM sqlite_master WHERE type = 'table'`).map((r) => r.name);
    const holding = tables.filter((name) => db.all(sql.raw(`SELECT * FROM "${name}"`)).some((r) => JSON.stringify(r).includes(secret)));
    expect(holding).toEqual([]);
    // The owner opens the page with the link exactly as the catcher received it.
    const link = /https?:\/\/\S+\/o\/(\S+)/.exec(received.text)?.[1] ?? '';
    expect(link).toBe(created.token);
    expect((await ownerPage(t, link)).job.reportedSymptoms).toBe('Chain skips under load');
  });

  it("shows the job's before/after pairs and serves their shots through the owner route only", async () => {
    const p = await ownerScenario(t);
    const j = `/api/jobs/${p.jobId}`;
    const upload = await p.mech.agent
      .post(`${j}/media`)
      .field('phase', 'after')
      .field('area', 'drivetrain')
      .attach('files', await solidJpeg(900, 600, '#3333aa'), 'after.jpg')
      .expect(201);
    const afterId = (upload.body as { assets: { id: number }[] }).assets[0].id;
    await derivativesSettled(t);
    await p.mech.agent
      .post(`${j}/pairs`)
      .send({ beforeAssetId: p.unlinkedAsset, afterAssetId: afterId, caption: 'Chain before and after cleaning' })
      .expect(201);
    const { token } = await createLink(p.desk, p.jobId);
    const page = await ownerPage(t, token);
    expect(page.pairs.map((x) => ({ caption: x.caption, before: x.before.id, after: x.after.id }))).toEqual([
      { caption: 'Chain before and after cleaning', before: p.unlinkedAsset, after: afterId },
    ]);
    const shot = await t.http().get(page.pairs[0].after.screenUrl).expect(200);
    expect(shot.headers['content-type']).toBe('image/jpeg');
    await t.http().get(`/api/owner/${token}/media/${afterId}/original`).expect(400);
    expect(page.report).toBeNull();
  });

  it('shows the owner only owner-facing data: derivatives via owner routes, no originals, no internal notes', async () => {
    const { token } = await createLink(s.desk, s.jobId);
    await s.desk.agent
      .post(`/api/jobs/${s.jobId}/recommendations/${s.chainRec}/decision`)
      .send({ status: 'pending', channel: 'phone', decidedByName: 'Ottilie', note: 'INTERNAL: owner haggles' })
      .expect(201);
    const page = await ownerPage(t, token);
    const text = JSON.stringify(page);
    expect(page.bike).toMatchObject({ maker: 'Quillon Works', model: 'Stratus 11' });
    expect(page.job.reportedSymptoms).toBe('Chain skips under load');
    expect(text).not.toMatch(/INTERNAL|original|tobin@|desk@|recordedBy|decisions/);
    const shots = page.findings.find((f) => f.id === s.chainFinding)?.shots ?? [];
    expect(shots.map((x) => x.id)).toEqual([s.linkedAsset]);
    const screen = await t.http().get(shots[0].screenUrl).expect(200);
    expect(screen.headers['content-type']).toBe('image/jpeg');
    await t.http().get(`/api/owner/${token}/media/${s.linkedAsset}/original`).expect(400);
    await t.http().get(`/api/owner/${token}/media/${s.linkedAsset}/print`).expect(400);
    await t.http().get(`/api/owner/${token}/media/${s.unlinkedAsset}/screen`).expect(404);
    await t.http().get(`/api/owner/${token}/media/${other.linkedAsset}/screen`).expect(404);
  });

  it('refuses another job: its media, its recommendations, and staff routes of either job', async () => {
    const { token } = await createLink(s.desk, s.jobId);
    const page = await ownerPage(t, token);
    const res = await t
      .http()
      .post(`/api/owner/${token}/decisions`)
      .send({ items: [{ ...seen(page, s.chainRec), recommendationId: other.chainRec, status: 'approved' }] })
      .expect(404);
    expect(res.body.code).toBe('NOT_FOUND');
    const otherFindings = (await other.desk.agent.get(`/api/jobs/${other.jobId}/findings`).expect(200)).body as FindingDto[];
    expect(otherFindings.every((f) => f.recommendation?.decisionStatus === 'pending')).toBe(true);
    for (const path of [
      `/api/jobs/${s.jobId}`,
      `/api/jobs/${other.jobId}`,
      `/api/jobs/${s.jobId}/findings`,
      `/api/jobs/${s.jobId}/owner-links`,
      `/api/jobs/${s.jobId}/media`,
      `/api/media/${s.linkedAsset}/screen`,
    ]) {
      expect((await t.http().get(path).set('authorization', `Bearer ${token}`)).status).toBe(401);
      expect((await t.http().get(path).set('cookie', `bp_session=${token}`)).status).toBe(401);
    }
  });

  it('refuses tampered, revoked and expired links with their own codes', async () => {
    const { token, link } = await createLink(s.desk, s.jobId);
    const tampered = (token[0] === 'A' ? 'B' : 'A') + token.slice(1);
    expect((await t.http().get(`/api/owner/${tampered}`).expect(404)).body.code).toBe('OWNER_LINK_INVALID');
    expect((await t.http().get('/api/owner/1').expect(404)).body.code).toBe('OWNER_LINK_INVALID');
    const clock = t.app.get<Clock>(CLOCK);
    const realNow = clock.now.bind(clock);
    const spy = vi.spyOn(clock, 'now').mockImplementation(() => new Date(realNow().getTime() + 8 * 24 * 3600e3));
    try {
      expect((await t.http().get(`/api/owner/${token}`).expect(410)).body.code).toBe('OWNER_LINK_EXPIRED');
      // Read through the service: eight days on, the desk's own session has expired too.
      const desk = { ...s.desk.user, email: '', name: '' } as AuthUser;
      expect(
        t.app
          .get(OwnerLinksService)
          .list(desk, s.jobId)
          .find((l) => l.id === link.id)?.state,
      ).toBe('expired');
    } finally {
      spy.mockRestore();
    }
    await ownerPage(t, token);
    await s.desk.agent.post(`/api/jobs/${s.jobId}/owner-links/${link.id}/revoke`).expect(200);
    expect((await t.http().get(`/api/owner/${token}`).expect(410)).body.code).toBe('OWNER_LINK_REVOKED');
    const next = await createLink(s.desk, s.jobId);
    await ownerPage(t, next.token);
    expect((await t.http().get(`/api/owner/${token}`).expect(410)).body.code).toBe('OWNER_LINK_REVOKED');
  });
});
