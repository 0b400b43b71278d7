import Database from 'better-sqlite3';
import { TERMINAL_STATUSES } from '@benchproof/domain';
import { seedBulkRecords } from '../../src/seed/bulk-records';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

/** A job as the reference reads it straight from the table. */
interface Ref {
  id: number;
  number: string;
  status: string;
  promised: string | null;
  mechanicId: number | null;
  createdAt: number;
}

const DONE = ['ready', 'collected', 'cancelled'];
type Sort = 'promisedOn' | 'createdAt' | 'number' | 'status';
const key: Record<Sort, (j: Ref) => string | number | null> = {
  promisedOn: (j) => j.promised,
  createdAt: (j) => j.createdAt,
  number: (j) => j.number,
  status: (j) => j.status,
};

/** SQLite order: NULL first ascending and last descending; ties by oldest booking (id ascending) in either direction. */
function order(sort: Sort, dir: 'asc' | 'desc') {
  return (a: Ref, b: Ref) => {
    const [x, y] = [key[sort](a), key[sort](b)];
    const c = x === y ? 0 : x === null ? -1 : y === null ? 1 : x < y ? -1 : 1;
    return (dir === 'asc' ? c : -c) || a.id - b.id;
  };
}

interface Shape {
  query: string;
  keep: (j: Ref, today: string) => boolean;
  sort?: Sort;
  dir?: 'asc' | 'desc';
  page?: number;
}

const shapes = (mechanicId: number, [from, to]: string[]): Shape[] => [
  { query: 'open=true', keep: (j) => !TERMINAL_STATUSES.includes(j.status as never) },
  { query: 'open=false&sort=number&order=desc&page=3', keep: (j) => TERMINAL_STATUSES.includes(j.status as never), sort: 'number', dir: 'desc', page: 3 },
  { query: 'open=true&sort=createdAt&order=desc&page=2', keep: (j) => !TERMINAL_STATUSES.includes(j.status as never), sort: 'createdAt', dir: 'desc', page: 2 },
  { query: 'status=in_work', keep: (j) => j.status === 'in_work' },
  { query: 'status=collected&sort=number&order=desc', keep: (j) => j.status === 'collected', sort: 'number', dir: 'desc' },
  { query: 'status=on_stand,booked_in,ready&sort=status', keep: (j) => ['on_stand', 'booked_in', 'ready'].includes(j.status), sort: 'status' },
  { query: `mechanicId=${mechanicId}&sort=createdAt&order=desc`, keep: (j) => j.mechanicId === mechanicId, sort: 'createdAt', dir: 'desc' },
  { query: 'overdue=true', keep: (j, today) => !!j.promised && j.promised < today && !DONE.includes(j.status) },
  { query: 'overdue=false&page=40', keep: (j, today) => !j.promised || j.promised >= today || DONE.includes(j.status), page: 40 },
  { query: `promisedAfter=${from}&promisedBefore=${to}&order=desc`, keep: (j) => !!j.promised && j.promised >= from && j.promised <= to, dir: 'desc' },
  { query: `status=collected&promisedAfter=${from}&page=2`, keep: (j) => j.status === 'collected' && !!j.promised && j.promised >= from, page: 2 },
];

describe('jobs list: every filter shape answers like a plain reference (prepared statements reused per shape)', () => {
  let t: TestApp;
  let desk: SignedIn;
  let ref: Ref[];
  let mechanicId: number;

  beforeAll(async () => {
    t = await startTestApp();
    desk = await t.signIn(DEMO.desk);
    const sqlite = new Database(t.cfg.DATABASE_PATH);
    seedBulkRecords(sqlite, desk.user.shopId, { customers: 1_000, jobs: 3_000 });
    ref = sqlite
      .prepare('SELECT id, number, status, promised_on AS promised, mechanic_id AS mechanicId, created_at AS createdAt FROM jobs WHERE shop_id = ?')
      .all(desk.user.shopId) as Ref[];
    mechanicId = (sqlite.prepare("SELECT id FROM users WHERE shop_id = ? AND role = 'mechanic' LIMIT 1").get(desk.user.shopId) as { id: number }).id;
    sqlite.close();
  }, 60_000);
  afterAll(() => t.close());

  async function expectLikeReference(s: Shape, today: string) {
    const res = await desk.agent.get(`/api/jobs?${s.query}&pageSize=25`).expect(200);
    const expected = ref.filter((j) => s.keep(j, today)).sort(order(s.sort ?? 'promisedOn', s.dir ?? 'asc'));
    const start = ((s.page ?? 1) - 1) * 25;
    expect(expected.length, s.query).toBeGreaterThan(start);
    expect(res.body.total, s.query).toBe(expected.length);
    expect(
      res.body.items.map((i: { id: number }) => i.id),
      s.query,
    ).toEqual(expected.slice(start, start + 25).map((j) => j.id));
  }

  it('answers each shape, then each again in reverse order with the statements already prepared', async () => {
    const today = new Date().toISOString().slice(0, 10);
    // A promised-date window over the middle fifth of the seeded jobs.
    const days = ref.flatMap((j) => (j.promised ? [j.promised] : [])).sort();
    const all = shapes(mechanicId, [days[Math.floor(days.length * 0.4)], days[Math.floor(days.length * 0.6)]]);
    for (const s of [...all, ...[...all].reverse()]) await expectLikeReference(s, today);
  });

  it('lists open jobs promised for the same day oldest booking first (product decision, session 18)', async () => {
    const res = await desk.agent.get('/api/jobs?open=true&pageSize=100').expect(200);
    const rows = res.body.items as { id: number; promisedOn: string | null }[];
    const sameDay = rows.slice(1).flatMap((r, i) => (r.promisedOn === rows[i].promisedOn ? [[rows[i].id, r.id]] : []));
    expect(sameDay.length).toBeGreaterThan(0);
    for (const [earlier, later] of sameDay) expect(later).toBeGreaterThan(earlier);
  });

  it('names the assigned mechanic on a list row, and an unassigned job has none', async () => {
    const res = await desk.agent.get(`/api/jobs?mechanicId=${mechanicId}`).expect(200);
    const staff = (await desk.agent.get('/api/users').expect(200)).body as { id: number; name: string }[];
    expect(res.body.items[0].mechanic).toEqual({ id: mechanicId, name: staff.find((u) => u.id === mechanicId)?.name });
    const unassigned = (await desk.agent.get('/api/jobs?status=collected&pageSize=5').expect(200)).body.items;
    expect(unassigned.map((i: { mechanic: unknown }) => i.mechanic)).toContain(null);
  });
});
