import Database from 'better-sqlite3';
import { TERMINAL_STATUSES } from '@benchproof/domain';
import { seedBulkRecords } from '../../src/seed/bulk-records';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

interface RefJob {
  id: number;
  status: string;
  promised: string | null;
  words: string[];
}

/** Words as a person reads them: runs of letters and digits, lower-cased. */
const words = (...texts: string[]) =>
  texts
    .join(' ')
    .toLowerCase()
    .match(/[\p{L}\p{N}]+/gu) ?? [];

/** A straightforward reference: every typed word must start some word of the job's number, owner or bike. */
const matches = (job: RefJob, q: string) => words(q).every((w) => job.words.some((x) => x.startsWith(w)));

/** SQLite sorts NULL first ascending; ties by oldest booking (id ascending), as the list does. */
const byPromised = (a: RefJob, b: RefJob) => ((a.promised ?? '') < (b.promised ?? '') ? -1 : (a.promised ?? '') > (b.promised ?? '') ? 1 : a.id - b.id);

describe('search at scale: 50,000 customers and bikes, 50,000 jobs in one shop', () => {
  let t: TestApp;
  let desk: SignedIn;
  let ref: RefJob[];
  let refCustomers: string[][];

  beforeAll(async () => {
    t = await startTestApp();
    desk = await t.signIn(DEMO.desk);
    const sqlite = new Database(t.cfg.DATABASE_PATH);
    seedBulkRecords(sqlite, desk.user.shopId, { customers: 50_000, jobs: 50_000 });
    ref = (
      sqlite
        .prepare(
          `SELECT j.id, j.status, j.promised_on AS promised, j.number, c.name, c.email, c.phone, b.maker, b.model, b.serial_number AS serial
           FROM jobs j JOIN customers c ON c.id = j.customer_id JOIN bikes b ON b.id = j.bike_id WHERE j.shop_id = ?`,
        )
        .all(desk.user.shopId) as (RefJob & Record<string, string>)[]
    ).map((r) => ({ id: r.id, status: r.status, promised: r.promised, words: words(r.number, r.name, r.email, r.phone, r.maker, r.model, r.serial) }));
    refCustomers = (sqlite.prepare('SELECT name, email, phone FROM customers WHERE shop_id = ?').all(desk.user.shopId) as Record<string, string>[]).map((c) =>
      words(c.name, c.email, c.phone),
    );
    sqlite.close();
  }, 120_000);
  afterAll(() => t.close());

  it.each(['e', 'ada ash', 'quillon', 'blk-4999', 'owner123'])('jobs ?q=%s answers the same rows, in the same order, as the reference', async (q) => {
    const res = await desk.agent.get(`/api/jobs?q=${encodeURIComponent(q)}&pageSize=100`).expect(200);
    const expected = ref.filter((j) => matches(j, q)).sort(byPromised);
    expect(expected.length).toBeGreaterThan(0);
    expect(res.body.total).toBe(expected.length);
    expect(res.body.items.map((i: { id: number }) => i.id)).toEqual(expected.slice(0, 100).map((j) => j.id));
  });

  it('the default open-jobs page matches the reference', async () => {
    const res = await desk.agent.get('/api/jobs?open=true&pageSize=50').expect(200);
    const expected = ref.filter((j) => !TERMINAL_STATUSES.includes(j.status as never)).sort(byPromised);
    expect(res.body.total).toBe(expected.length);
    expect(res.body.items.map((i: { id: number }) => i.id)).toEqual(expected.slice(0, 50).map((j) => j.id));
  });

  it.each(['%', '_', '%_%', '"', '*'])('treats %s as text, not a wildcard: it matches nobody', async (q) => {
    for (const path of ['jobs', 'customers', 'bikes']) {
      const res = await desk.agent.get(`/api/${path}?q=${encodeURIComponent(q)}`).expect(200);
      expect(res.body.total).toBe(0);
    }
  });

  it('customers and bikes searches answer at this size', async () => {
    const customers = await desk.agent.get('/api/customers?q=e').expect(200);
    expect(customers.body.total).toBe(refCustomers.filter((c) => c.some((w) => w.startsWith('e'))).length);
    expect(customers.body.total).toBeGreaterThan(5_000);
    const bikes = await desk.agent.get('/api/bikes?q=owner49999').expect(200);
    expect(bikes.body.total).toBe(0);
    const byOwner = await desk.agent.get('/api/bikes?q=ada%20eastry%2049984').expect(200);
    expect(byOwner.body.items.map((b: { serialNumber: string }) => b.serialNumber)).toEqual(['BLK-49984']);
  });

  it('customer pages answer like a sorted reference, whichever sort came before (statements reused per shape)', async () => {
    const db = new Database(t.cfg.DATABASE_PATH, { readonly: true });
    const byName = db.prepare('SELECT id FROM customers WHERE shop_id = ? ORDER BY name DESC, id ASC LIMIT 20 OFFSET 40').pluck().all(desk.user.shopId);
    const byAge = db.prepare('SELECT id FROM customers WHERE shop_id = ? ORDER BY created_at ASC, id ASC LIMIT 20 OFFSET 20').pluck().all(desk.user.shopId);
    db.close();
    for (let round = 0; round < 2; round++) {
      const names = await desk.agent.get('/api/customers?sort=name&order=desc&page=3&pageSize=20').expect(200);
      expect(names.body.items.map((c: { id: number }) => c.id)).toEqual(byName);
      const ages = await desk.agent.get('/api/customers?sort=createdAt&order=asc&page=2&pageSize=20').expect(200);
      expect(ages.body.items.map((c: { id: number }) => c.id)).toEqual(byAge);
    }
  });
});
