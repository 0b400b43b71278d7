import type Database from 'better-sqlite3';
import { CONSENT_WORDING } from '@benchproof/contracts';
import { SQLITE } from '../../src/core/db';
import { jobWithRecords, OWNER, settled } from '../reports/report-fixtures';
import { DEMO, startTestApp, type TestApp } from '../test-app';

const PERSONAL = { name: OWNER, email: 'zsofia@example.test', phone: '+447700900461' };

/** Every text cell of every table (sqlite_master + PRAGMA table_info) that holds `needle`, as table.column. */
function scanText(db: Database.Database, needle: string): string[] {
  const hits: string[] = [];
  const tables = db.prepare(`SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'`).pluck().all() as string[];
  for (const t of tables)
    for (const c of db.prepare('SELECT name FROM pragma_table_info(?)').pluck().all(t) as string[]) {
      const n = db.prepare(`SELECT count(*) FROM "${t}" WHERE typeof("${c}") = 'text' AND instr(lower("${c}"), lower(?)) > 0`).pluck().get(needle) as number;
      if (n > 0) hits.push(`${t}.${c}`);
    }
  return hits;
}

describe('erasing a customer on request', () => {
  let t: TestApp;
  let db: Database.Database;
  beforeAll(async () => {
    t = await startTestApp();
    db = t.app.get<{ sqlite: Database.Database }>(SQLITE).sqlite;
  });
  afterAll(() => t.close());

  it('leaves no personal field of that customer in any table, withdraws consent, audits without the data, and keeps everyone else intact', async () => {
    const ctx = await jobWithRecords(t, 2);
    await ctx.m.agent
      .post(`${ctx.base}/consent`)
      .send({ granted: true, nameMakeModel: true, wordingVersion: CONSENT_WORDING.version, givenByName: OWNER })
      .expect(201);
    await ctx.m.agent.post(`${ctx.base}/reports/drafts`).expect(202);
    await settled(t);
    const customerId = (db.prepare('SELECT customer_id FROM jobs WHERE id = ?').pluck().get(ctx.job.id) as number) ?? 0;
    // A text already sent to the owner's phone (texts keep the number they went to).
    db.prepare(
      `INSERT INTO text_messages (shop_id, job_id, customer_id, kind, to_number, body, status, attempts, created_at)
       SELECT shop_id, id, customer_id, 'ready_to_collect', ?, 'Ready to collect', 'delivered', 1, 0 FROM jobs WHERE id = ?`,
    ).run(PERSONAL.phone, ctx.job.id);
    for (const v of Object.values(PERSONAL)) expect(scanText(db, v).length).toBeGreaterThan(0);
    const others = db.prepare('SELECT id, name, email, phone, notes FROM customers WHERE id != ? ORDER BY id').all(customerId);
    const otherJobs = db.prepare('SELECT * FROM jobs WHERE customer_id != ? ORDER BY id').all(customerId);
    const otherMedia = db.prepare('SELECT id, original_key, sha256 FROM media_assets WHERE job_id != ? ORDER BY id').all(ctx.job.id);

    const desk = await t.signIn(DEMO.desk);
    expect((await desk.agent.post(`/api/customers/${customerId}/erase`).send({ confirmCustomerId: customerId }).expect(403)).body.code).toBe('FORBIDDEN');
    expect(
      (
        await ctx.m.agent
          .post(`/api/customers/${customerId}/erase`)
          .send({ confirmCustomerId: customerId + 1 })
          .expect(400)
      ).body.code,
    ).toBe('VALIDATION_FAILED');
    const res = await ctx.m.agent.post(`/api/customers/${customerId}/erase`).send({ confirmCustomerId: customerId }).expect(200);
    expect(res.body).toMatchObject({ customerId, jobs: 1, mediaKept: 0 });
    expect(res.body.mediaDeleted).toBeGreaterThan(0);

    for (const v of Object.values(PERSONAL)) expect({ needle: v, hits: scanText(db, v) }).toEqual({ needle: v, hits: [] });
    const consent = (await ctx.m.agent.get(`${ctx.base}/consent`).expect(200)).body as { current: { granted: boolean } };
    expect(consent.current.granted).toBe(false);
    const audit = (await ctx.m.agent.get(`/api/audit?entityType=customer&entityId=${customerId}`).expect(200)).body as { action: string; details: unknown }[];
    expect(audit.map((a) => a.action)).toContain('customer.erased');
    for (const v of Object.values(PERSONAL)) expect(JSON.stringify(audit)).not.toContain(v);
    // The job record stays (number, bike, findings), without the person.
    expect((await ctx.m.agent.get(ctx.base).expect(200)).body).toMatchObject({ number: ctx.job.number });

    expect(db.prepare('SELECT id, name, email, phone, notes FROM customers WHERE id != ? ORDER BY id').all(customerId)).toEqual(others);
    expect(db.prepare('SELECT * FROM jobs WHERE customer_id != ? ORDER BY id').all(customerId)).toEqual(otherJobs);
    expect(db.prepare('SELECT id, original_key, sha256 FROM media_assets WHERE job_id != ? ORDER BY id').all(ctx.job.id)).toEqual(otherMedia);
  }, 180_000);
});
