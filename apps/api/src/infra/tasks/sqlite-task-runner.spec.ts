import { Logger } from '@nestjs/common';
import { openDb } from '../../core/db';
import { systemClock } from '../../core/clock';
import { SqliteTaskRunner, type SqliteRunnerOptions } from './sqlite-task-runner';
import { TaskStore } from './task-store';
import type { RawTaskContext } from './tasks.port';

const OPTIONS: SqliteRunnerOptions = {
  pollMs: 1000,
  leaseMs: 30_000,
  backoff: { baseMs: 1000, maxMs: 60_000 },
  longBackoff: { baseMs: 3_600_000, maxMs: 86_400_000 },
  maxAttempts: 5,
};

const record = <T>(into: T[], item: T): Promise<void> => {
  into.push(item);
  return Promise.resolve();
};

function setUp(opts: Partial<SqliteRunnerOptions> = {}) {
  const { db, sqlite } = openDb(':memory:');
  const runner = new SqliteTaskRunner(new TaskStore(db), systemClock, { ...OPTIONS, ...opts });
  const calls: RawTaskContext[] = [];
  return { db, sqlite, runner, calls };
}

describe('SqliteTaskRunner', () => {
  beforeAll(() => Logger.overrideLogger(false));
  it('never runs a task enqueued in a transaction that rolled back', async () => {
    const { db, runner, calls } = setUp();
    runner.register('demo.work', (t) => record(calls, t), { concurrency: 1 });
    runner.start();
    expect(() =>
      db.transaction((tx) => {
        runner.enqueue({ kind: 'demo.work', key: 'rolled-back', shopId: null }, tx);
        throw new Error('the change failed');
      }),
    ).toThrow('the change failed');
    db.transaction((tx) => runner.enqueue({ kind: 'demo.work', key: 'committed', shopId: null }, tx));
    await runner.settled();
    expect(calls.map((c) => c.key)).toEqual(['committed']);
    expect(runner.status('demo.work', 'rolled-back')).toBeNull();
    expect(runner.status('demo.work', 'committed')?.state).toBe('done');
    await runner.stop();
  });

  it('runs the same (kind, key) once however often it is enqueued', async () => {
    const { runner, calls } = setUp();
    runner.register('demo.work', (t) => record(calls, t), { concurrency: 2 });
    runner.start();
    runner.enqueue({ kind: 'demo.work', key: 'asset-7', shopId: null, payload: { messageId: 1 } });
    runner.enqueue({ kind: 'demo.work', key: 'asset-7', shopId: null, payload: { messageId: 2 } });
    await runner.settled();
    runner.enqueue({ kind: 'demo.work', key: 'asset-7', shopId: null, payload: { messageId: 3 } });
    await runner.settled();
    expect(calls).toHaveLength(1);
    expect(calls[0].payload).toEqual({ messageId: 1 });
    await runner.stop();
  });

  it('never runs more tasks of a kind at once than its concurrency', async () => {
    const { runner } = setUp();
    let running = 0;
    let peak = 0;
    runner.register(
      'demo.slow',
      async () => {
        peak = Math.max(peak, ++running);
        await new Promise((r) => setTimeout(r, 5));
        running--;
      },
      { concurrency: 2 },
    );
    runner.start();
    for (let i = 0; i < 6; i++) runner.enqueue({ kind: 'demo.slow', key: `k${i}`, shopId: null });
    await runner.settled();
    expect(peak).toBe(2);
    expect(['k0', 'k5'].map((k) => runner.status('demo.slow', k)?.state)).toEqual(['done', 'done']);
    await runner.stop();
  });

  it('ends failed with the last error once maxAttempts is used up, and a new enqueue queues it again', async () => {
    const { runner } = setUp({ backoff: { baseMs: 10, maxMs: 10 } });
    let fail = true;
    runner.register('demo.flaky', () => (fail ? Promise.reject(new Error('disk full')) : Promise.resolve()), { concurrency: 1, maxAttempts: 2 });
    runner.start();
    runner.enqueue({ kind: 'demo.flaky', key: 'x', shopId: null });
    await runner.settled();
    expect(runner.status('demo.flaky', 'x')).toMatchObject({ state: 'failed', attempts: 2, lastError: 'disk full' });
    fail = false;
    runner.enqueue({ kind: 'demo.flaky', key: 'x', shopId: null });
    await runner.settled();
    expect(runner.status('demo.flaky', 'x')).toMatchObject({ state: 'done', attempts: 1, lastError: null });
    await runner.stop();
  });

  describe('with fake timers', () => {
    beforeEach(() => vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'setInterval', 'clearInterval', 'setImmediate', 'Date'] }));
    afterEach(() => vi.useRealTimers());

    it('retries a handler that fails twice, then ends done after three attempts with growing delays', async () => {
      const { runner } = setUp();
      const at: number[] = [];
      runner.register(
        'demo.retry',
        (t) => {
          at.push(Date.now());
          return t.attempt < 3 ? Promise.reject(new Error(`try ${t.attempt} failed`)) : Promise.resolve();
        },
        { concurrency: 1 },
      );
      runner.start();
      runner.enqueue({ kind: 'demo.retry', key: 'job-1', shopId: null });
      const settled = runner.settled();
      await vi.advanceTimersByTimeAsync(10_000);
      await settled;
      expect(runner.status('demo.retry', 'job-1')).toMatchObject({ state: 'done', attempts: 3, lastError: null, progress: 1 });
      const delays = [at[1] - at[0], at[2] - at[1]];
      // Equal jitter: retry n waits between half and all of 1000·2^(n-1) ms.
      expect(delays[0]).toBeGreaterThanOrEqual(500);
      expect(delays[0]).toBeLessThanOrEqual(1000);
      expect(delays[1]).toBeGreaterThanOrEqual(1000);
      expect(delays[1]).toBeLessThanOrEqual(2000);
      expect(delays[1]).toBeGreaterThan(delays[0]);
      await runner.stop();
    });

    it('takes back a running task whose lease ran out (its process died) and runs it again', async () => {
      const { db, runner } = setUp({ leaseMs: 5000 });
      // A task claimed by a process that was then killed: running, lease held by someone else.
      const dead = new TaskStore(db);
      dead.insert({ kind: 'demo.work', key: 'orphan', shopId: null }, new Date());
      expect(dead.claim('demo.work', 1, 'killed-process', new Date(), 5000)).toHaveLength(1);
      const keys: string[] = [];
      runner.register('demo.work', (t) => record(keys, `${t.key}#${t.attempt}`), { concurrency: 1 });
      runner.start();
      await vi.advanceTimersByTimeAsync(4000);
      expect(keys).toEqual([]);
      await vi.advanceTimersByTimeAsync(2500);
      expect(keys).toEqual(['orphan#2']);
      expect(runner.status('demo.work', 'orphan')?.state).toBe('done');
      await runner.stop();
    });
  });
});
