// Shared by the ladder and memory benches: a shop of BENCH_JOBS jobs on disk, the built API started with the
// probe preloaded (CPU time and memory from inside the process), and autocannon windows at 50 connections.
import autocannon from 'autocannon';
import Database from 'better-sqlite3';
import { fork } from 'node:child_process';
import { createRequire } from 'node:module';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ENTRY_REL, START_ENV, freePort, signIn, startDemoApi, waitForHealth, waitForIdleTasks } from './bench-lib.mjs';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
export const JOBS = Number(process.env.BENCH_JOBS ?? 10_000);
const PROBE = join(ROOT, 'apps/api/bench/probe.cjs');

/** One autocannon window: req/s, p50/p99 in ms, requests done and failures (errors, non-2xx). */
export const load = (url, headers, duration) =>
  new Promise((ok, fail) =>
    autocannon({ url, connections: 50, duration, headers }, (err, r) =>
      err ? fail(err) : ok({ rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, total: r.requests.total, errors: r.errors + r.non2xx }),
    ),
  );

/** The server's process.cpuUsage() (µs) and process.memoryUsage() (bytes), via probe.cjs. */
export function probe(child) {
  return new Promise((ok) => {
    const on = (m) => m?.probe && (child.off('message', on), ok(m.probe));
    child.on('message', on);
    child.send('probe');
  });
}

/** A migrated database with the demo seed plus `jobs` bulk jobs in shop 1; env for every server that opens it. */
export async function prepareShop(dir, jobs = JOBS) {
  const env = {
    DATABASE_PATH: join(dir, 'bench.sqlite'),
    UPLOADS_DIR: join(dir, 'uploads'),
    WEB_DIST: join(dir, 'no-web'),
    MAIL_CATCHER: 'false',
    LOGIN_THROTTLE_LIMIT: '1000',
    JWT_SECRET: 'bench-only-secret-bench-only-secret-0123',
  };
  const demo = await startDemoApi(ROOT, dir, env);
  await demo.stop();
  const req = createRequire(join(ROOT, 'apps/api/package.json'));
  const { seedBulkRecords } = req(join(ROOT, 'dist/apps/api/apps/api/src/seed/bulk-records.js'));
  const sqlite = new Database(env.DATABASE_PATH);
  seedBulkRecords(sqlite, 1, { customers: Math.ceil(jobs / 3), jobs });
  sqlite.close();
  const session = ({ cookie }) => ({ cookie, token: /bp_session=([^;]+)/.exec(cookie)[1] });
  return { env, jobs, signIn, session };
}

/** The built API, forked with the probe preloaded, on a free port; resolves once its background tasks settled. */
export async function startProbed(dir, env, extra = {}) {
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const child = fork(join(ROOT, ENTRY_REL), {
    execArgv: ['-r', PROBE, ...(extra.execArgv ?? [])],
    env: { ...START_ENV, ...process.env, LOG_LEVEL: 'info', ...env, PORT: String(port), ...(extra.env ?? {}) },
    stdio: ['ignore', 'ignore', 'inherit', 'ipc'],
  });
  await waitForHealth(base, child);
  await waitForIdleTasks(base);
  const stop = () => new Promise((ok) => (child.exitCode !== null ? ok() : (child.once('exit', ok), child.kill())));
  return { base, child, stop };
}
