// Jobs list at the size of three years of one busy shop: 10,000 jobs, 50 connections.
// Baseline in the same run: a bare Express route answering the same captured JSON.
import autocannon from 'autocannon';
import Database from 'better-sqlite3';
import express from 'express';
import { mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { signIn, startDemoApi, waitForIdleTasks } from './bench-lib.mjs';
import { atLeast, atMost, emitRow, medianOf3 } from './table.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
const require = createRequire(join(root, 'apps/api/package.json'));
const { seedBulkRecords } = require(join(root, 'dist/apps/api/apps/api/src/seed/bulk-records.js'));
const JOBS = Number(process.env.BENCH_JOBS ?? 10_000);

const load = (url, headers, duration = 5) =>
  new Promise((ok, fail) =>
    autocannon({ url, connections: 50, duration, headers }, (err, r) =>
      err ? fail(err) : ok({ rps: r.requests.average, p99: r.latency.p99, errors: r.errors + r.non2xx }),
    ),
  );

function bareServer(payload) {
  const app = express();
  app.get('/', (_req, res) => res.json(payload));
  return new Promise((ok) => {
    const s = app.listen(0, '127.0.0.1', () => ok({ url: `http://127.0.0.1:${s.address().port}/`, close: () => s.close() }));
  });
}

async function measure(api, cookie, path, label, minRatio, maxP99) {
  const url = `${api.base}${path}`;
  const payload = await (await fetch(url, { headers: { cookie } })).json();
  const bare = await bareServer(payload);
  // Both sides warm up first (JIT, SQLite page cache, prepared statements), then three timed runs.
  await load(bare.url, {}, 2);
  const b = await medianOf3(() => load(bare.url, {}), 'rps');
  bare.close();
  await load(url, { cookie }, 2);
  const p = await medianOf3(() => load(url, { cookie }), 'rps');
  const row = atLeast(`${label}, 50 conns, ${JOBS} jobs: req/s`, b.rps, p.rps, 'req/s', minRatio, p.errors ? ` (${p.errors} errors)` : '');
  emitRow({ ...row, target: `${row.target}, no errors`, met: row.met && p.errors === 0 });
  emitRow({ ...atMost(`${label}: p99 latency`, b.p99, p.p99, 'ms', Infinity), target: `≤ ${maxP99} ms`, met: p.p99 <= maxP99 });
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-jobs-'));
  let api = await startDemoApi(root, dir);
  try {
    await api.stop();
    const sqlite = new Database(join(dir, 'bench.sqlite'));
    seedBulkRecords(sqlite, 1, { customers: Math.ceil(JOBS / 3), jobs: JOBS });
    sqlite.close();
    api = await startDemoApi(root, dir);
    await waitForIdleTasks(api.base);
    const { cookie } = await signIn(api.base);
    // Issue 22's targets: the open-jobs page ≥ 0.35× the bare route with p99 ≤ 60 ms; search and filters ≥ 0.3×, p99 ≤ 80 ms.
    await measure(api, cookie, '/api/jobs?open=true', 'jobs list, default page', 0.35, 60);
    await measure(api, cookie, '/api/jobs?q=ada', 'jobs search "ada"', 0.3, 80);
    await measure(api, cookie, '/api/jobs?status=in_work', 'jobs filtered by status', 0.3, 80);
  } finally {
    await api.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

// exit at once: a failed run can leave a server or stream open that would hold the table forever
main().catch((err) => {
  console.error(err);
  process.exit(1);
});
