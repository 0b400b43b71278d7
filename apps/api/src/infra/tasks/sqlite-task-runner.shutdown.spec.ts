import { Logger } from '@nestjs/common';
import { openDb } from '../../core/db';
import { systemClock } from '../../core/clock';
import { SqliteTaskRunner } from './sqlite-task-runner';
import { TaskStore } from './task-store';

const OPTIONS = {
  pollMs: 1000,
  leaseMs: 30_000,
  backoff: { baseMs: 1000, maxMs: 60_000 },
  longBackoff: { baseMs: 3_600_000, maxMs: 86_400_000 },
  maxAttempts: 5,
};

describe('SqliteTaskRunner shutdown', () => {
  beforeAll(() => Logger.overrideLogger(false));

  it('waits for a task that finishes within the grace, and leaves it done', async () => {
    const { db } = openDb(':memory:');
    const runner = new SqliteTaskRunner(new TaskStore(db), systemClock, OPTIONS);
    let started!: () => void;
    const running = new Promise<void>((ok) => (started = ok));
    runner.register('demo.slow', () => (started(), new Promise((ok) => setTimeout(ok, 150))), { concurrency: 1 });
    runner.start();
    runner.enqueue({ kind: 'demo.slow', key: 'a', shopId: null });
    await running;
    await runner.stop(5_000);
    expect(runner.status('demo.slow', 'a')).toMatchObject({ state: 'done', attempts: 1 });
  });

  it('releases a task still running after the grace: queued again, due now, the cut attempt not counted', async () => {
    const { db } = openDb(':memory:');
    const store = new TaskStore(db);
    const runner = new SqliteTaskRunner(store, systemClock, OPTIONS);
    let started!: () => void;
    const running = new Promise<void>((ok) => (started = ok));
    let finish!: () => void;
    runner.register('demo.stuck', () => (started(), new Promise<void>((ok) => (finish = ok))), { concurrency: 1 });
    runner.start();
    runner.enqueue({ kind: 'demo.stuck', key: 'b', shopId: null });
    await running;
    const t0 = Date.now();
    await runner.stop(100);
    expect(Date.now() - t0).toBeLessThan(2_000);
    const status = runner.status('demo.stuck', 'b');
    expect(status).toMatchObject({ state: 'queued', attempts: 0 });
    expect(Date.parse(status?.nextRunAt ?? '')).toBeLessThanOrEqual(Date.now());
    // The cut-short handler finishing late changes nothing: the row is no longer its own.
    finish();
    await new Promise((ok) => setTimeout(ok, 20));
    expect(runner.status('demo.stuck', 'b')?.state).toBe('queued');
    // Another process takes it at once (not after the 30 s lease).
    const next = new SqliteTaskRunner(store, systemClock, OPTIONS);
    const runs: string[] = [];
    next.register('demo.stuck', (t) => (runs.push(t.key), Promise.resolve()), { concurrency: 1 });
    next.start();
    await next.settled();
    expect(runs).toEqual(['b']);
    expect(next.status('demo.stuck', 'b')).toMatchObject({ state: 'done', attempts: 1 });
    await next.stop();
  });
});
