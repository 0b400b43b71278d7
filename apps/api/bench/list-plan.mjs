// `node apps/api/bench/list-plan.mjs [jobs…]`: the jobs list's statements at each shop size — EXPLAIN QUERY PLAN
// and µs per call of the total (count) and the page, for the open-jobs page, a search and a status filter.
// Run after a build; not part of `npm run bench` (it seeds a shop per size). DEVELOPERS.md keeps the figures.
import { mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { prepareShop, ROOT } from './load-lib.mjs';

const req = createRequire(join(ROOT, 'apps/api/package.json'));
const dist = (p) => req(join(ROOT, 'dist/apps/api/apps/api/src', p));
const { openDb } = dist('core/db');
const { JobsListQuery } = dist('jobs/jobs-list.query.js');
const { JobListQuerySchema } = req(join(ROOT, 'dist/apps/api/libs/contracts/src/index.js'));
const { ftsPrefixQuery } = dist('core/db');
const { PaymentsRepository } = dist('payments/payments.repository.js');

const CASES = [
  ['open jobs', { open: 'true' }],
  ['search "ada"', { q: 'ada' }],
  ['status in_work', { status: 'in_work' }],
];

function timeIt(fn, n = 300) {
  fn();
  const t = process.hrtime.bigint();
  for (let i = 0; i < n; i++) fn();
  return Number(process.hrtime.bigint() - t) / n / 1000;
}

function report(sqlite, q, label, raw) {
  const query = JobListQuerySchema.parse(raw);
  const text = query.q ? ftsPrefixQuery(query.q) : null;
  const values = { shopId: 1, today: new Date().toISOString().slice(0, 10), text, limit: query.pageSize, offset: 0 };
  query.status?.forEach((st, i) => (values[`status${i}`] = st));
  const bind = (stmt) => stmt.getQuery().params.map((p) => (p && typeof p === 'object' && 'name' in p ? values[p.name] : p));
  console.log(`\n${label}: whole page() ${timeIt(() => q.page(1, { query, today: values.today })).toFixed(0)} µs`);
  for (const [part, stmt] of [
    ['total', q.buildTotal(query, text !== null)],
    ['page', q.buildPage(query, text !== null)],
  ]) {
    if (part === 'page')
      balances(
        sqlite,
        q.page(1, { query, today: values.today }).rows.map((r) => r.id),
      );
    const { sql } = stmt.getQuery();
    const s = sqlite.prepare(sql);
    const args = bind(stmt);
    const run = part === 'total' ? () => s.get(...args) : () => s.all(...args);
    console.log(`  ${part}: ${timeIt(run).toFixed(0)} µs`);
    for (const row of sqlite.prepare(`EXPLAIN QUERY PLAN ${sql}`).all(...args)) console.log(`    ${row.detail}`);
  }
}

/** The page's money due: the three reads of payments' balance, for the page's job ids (one JSON list). */
function balances(sqlite, ids) {
  const repo = new PaymentsRepository(null);
  const stmts = repo.prepareCharged.call({ db: openDb.lastDb });
  for (const [name, stmt] of Object.entries(stmts)) {
    const { sql } = stmt.getQuery();
    const s = sqlite.prepare(sql);
    const args = stmt.getQuery().params.map((p) => (p && typeof p === 'object' && 'name' in p ? { shopId: 1, ids: JSON.stringify(ids) }[p.name] : p));
    console.log(`  balance ${name} (${ids.length} jobs): ${timeIt(() => s.all(...args)).toFixed(0)} µs`);
    for (const row of sqlite.prepare(`EXPLAIN QUERY PLAN ${sql}`).all(...args)) console.log(`    ${row.detail}`);
  }
}

for (const jobs of process.argv
  .slice(2)
  .map(Number)
  .concat(process.argv.length > 2 ? [] : [10_000, 50_000])) {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-plan-'));
  try {
    const shop = await prepareShop(dir, jobs);
    const { db, sqlite } = openDb(shop.env.DATABASE_PATH);
    openDb.lastDb = db;
    const open = sqlite.prepare("SELECT count(*) n FROM jobs WHERE shop_id = 1 AND status NOT IN ('collected','cancelled')").get().n;
    console.log(`\n=== ${jobs} jobs (${open} open) ===`);
    const q = new JobsListQuery(db);
    for (const [label, raw] of CASES) report(sqlite, q, label, raw);
    sqlite.close();
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
