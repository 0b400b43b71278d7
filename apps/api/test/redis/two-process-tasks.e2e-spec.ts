import Database from 'better-sqlite3';
import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { REPO_ROOT } from '../../src/config';
import { openDb } from '../../src/core/db';
import { TaskStore } from '../../src/infra/tasks';
import { describeRedis, freshPrefix, REDIS_URL, until } from './redis-suite';

const API_DIST = resolve(REPO_ROOT, 'dist/apps/api/apps/api/src');
const WORKER = resolve(__dirname, 'task-worker.mjs');
const TASKS = 50;

// Two processes on one queue (TASKS=redis) and one SQLite file: 50 tasks, one process killed
// (SIGKILL) halfway. Every task ends done with its effect written once; only the tasks the killed
// process had in hand run again (BullMQ's stalled-job check hands them to the survivor).
describeRedis('two processes, one queue, one process killed halfway', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-2proc-'));
  const dbPath = join(dir, 'db.sqlite');
  const prefix = freshPrefix();
  const children: ChildProcess[] = [];
  afterAll(() => {
    for (const c of children) if (c.exitCode === null) c.kill('SIGKILL');
    rmSync(dir, { recursive: true, force: true });
  });

  const startWorker = async (): Promise<ChildProcess> => {
    const env = { ...process.env, API_DIST, DATABASE_PATH: dbPath, REDIS_URL: REDIS_URL!, REDIS_PREFIX: prefix, TASK_LEASE_MS: '1500' };
    const child = spawn(process.execPath, [WORKER], { env, stdio: ['ignore', 'pipe', 'pipe'] });
    children.push(child);
    let out = '';
    child.stderr?.on('data', (d) => (out += String(d)));
    await new Promise<void>((ready, failed) => {
      child.stdout?.on('data', (d) => String(d).includes('ready') && ready());
      child.once('exit', (code) => failed(new Error(`worker exited with ${code}: ${out}`)));
    });
    return child;
  };

  it('does each of 50 tasks once in effect; only the killed process’s tasks in hand run twice', async () => {
    const { db, sqlite } = openDb(dbPath);
    sqlite.exec('create table demo_runs (key text, pid integer, phase text, at integer); create table demo_effects (key text primary key, pid integer)');
    const a = await startWorker();
    const b = await startWorker();
    const store = new TaskStore(db);
    db.transaction((tx) => {
      for (let i = 0; i < TASKS; i++) store.insert({ kind: 'demo.count', key: `n${i}`, shopId: null }, new Date(), tx);
    });
    const count = (sql: string): number => (sqlite.prepare(sql).get() as { n: number }).n;
    await until('half the effects', () => (count('select count(*) n from demo_effects') >= TASKS / 2 ? true : undefined), 60_000, 5);
    b.kill('SIGKILL');
    await until('every task done', () => (count(`select count(*) n from tasks where kind = 'demo.count' and status = 'done'`) === TASKS ? true : undefined));

    const read = new Database(dbPath, { readonly: true });
    const starts = read.prepare(`select key, count(*) n from demo_runs where phase = 'start' group by key`).all() as { key: string; n: number }[];
    const ends = read.prepare(`select key, count(*) n from demo_runs where phase = 'end' group by key`).all() as { key: string; n: number }[];
    const byPid = read.prepare(`select pid, count(*) n from demo_runs where phase = 'end' group by pid`).all() as { pid: number; n: number }[];
    const twice = starts.filter((s) => s.n > 1);
    read.close();
    console.log(
      `[two-process tasks] ${TASKS} tasks: effects ${count('select count(*) n from demo_effects')}, done ${TASKS}, ` +
        `handler starts ${starts.reduce((n, s) => n + s.n, 0)}, finished runs ${ends.reduce((n, s) => n + s.n, 0)}, ` +
        `run again after the kill ${twice.length}, finished per process ${JSON.stringify(byPid.map((p) => ({ [p.pid === a.pid ? 'survivor' : 'killed']: p.n })))}`,
    );
    expect(count('select count(*) n from demo_effects')).toBe(TASKS);
    expect(starts).toHaveLength(TASKS);
    // Both processes took work from the one queue before the kill.
    expect(byPid.map((p) => p.pid).sort()).toEqual([a.pid, b.pid].sort());
    // Only what the killed process had in hand (its concurrency, 4) ran again; no finished run was repeated.
    expect(twice.length).toBeLessThanOrEqual(4);
    expect(ends.every((e) => e.n === 1)).toBe(true);
    a.kill('SIGTERM');
    await new Promise((r) => a.once('exit', r));
    sqlite.close();
  });
});
