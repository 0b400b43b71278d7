import { Logger } from '@nestjs/common';
import { openDb } from '../../core/db';
import { systemClock } from '../../core/clock';
import { SqliteTaskRunner, type SqliteRunnerOptions } from './sqlite-task-runner';
import { PermanentTaskError } from './task-errors';
import { TaskStore } from './task-store';

const HOUR = 3_600_000;

const OPTIONS: SqliteRunnerOptions = {
  pollMs: 24 * HOUR, // the runner wakes at each retry time; no idle polls to step through
  leaseMs: 30_000,
  backoff: { baseMs: 1000, maxMs: 60_000 },
  longBackoff: { baseMs: HOUR, maxMs: 24 * HOUR },
  maxAttempts: 5,
};

/** What Node's fs raises when the disk is full (a fake: no disk is filled here). */
const diskFull = (): Error => Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });

function setUp() {
  const { db, sqlite } = openDb(':memory:');
  sqlite.pragma('foreign_keys = OFF'); // tasks of shop 1 without seeding a shop
  return { runner: new SqliteTaskRunner(new TaskStore(db), systemClock, OPTIONS) };
}

describe('SqliteTaskRunner: failed work comes back', () => {
  beforeAll(() => Logger.overrideLogger(false));
  beforeEach(() => vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'setInterval', 'clearInterval', 'setImmediate', 'Date'] }));
  afterEach(() => vi.useRealTimers());

  it('retries derivatives that failed for lack of space on the long backoff, and they finish once space returns', async () => {
    const { runner } = setUp();
    let spaceLeft = false;
    const finals: boolean[] = [];
    runner.register(
      'demo.derivatives',
      (t) => {
        finals.push(t.final);
        return spaceLeft ? Promise.resolve() : Promise.reject(diskFull());
      },
      { concurrency: 1, maxAttempts: 3 },
    );
    runner.start();
    runner.enqueue({ kind: 'demo.derivatives', key: '41', shopId: 1 });
    await vi.advanceTimersByTimeAsync(10_000);
    // Three quick attempts, the last one told it is the last; then failed, with a try set for later.
    expect(finals).toEqual([false, false, true]);
    const failed = runner.status('demo.derivatives', '41');
    expect(failed).toMatchObject({ state: 'failed', attempts: 3, lastError: expect.stringContaining('ENOSPC') });
    const later = Date.parse(failed?.nextRunAt ?? '') - Date.now();
    expect(later).toBeGreaterThanOrEqual(HOUR / 2);
    expect(later).toBeLessThanOrEqual(HOUR);
    expect(runner.failed(1).map((f) => f.key)).toEqual(['41']);

    spaceLeft = true;
    await vi.advanceTimersByTimeAsync(HOUR + 2000);
    expect(runner.status('demo.derivatives', '41')).toMatchObject({ state: 'done', attempts: 4, lastError: null });
    expect(runner.failed(1)).toEqual([]);
    await runner.stop();
  });

  it('waits longer after each transient failure, never more than a day', async () => {
    const { runner } = setUp();
    const at: number[] = [];
    runner.register(
      'demo.mail',
      () => {
        at.push(Date.now());
        return Promise.reject(Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:25'), { code: 'ECONNREFUSED' }));
      },
      { concurrency: 1, maxAttempts: 1 },
    );
    runner.start();
    runner.enqueue({ kind: 'demo.mail', key: 'm', shopId: 1 });
    await vi.advanceTimersByTimeAsync(8 * 24 * HOUR);
    const gaps = at.slice(1).map((t, i) => t - at[i]);
    expect(gaps.length).toBeGreaterThan(5);
    // Equal jitter: the n-th long retry waits between half and all of 1 h·2^(n-1), capped at 24 h.
    gaps.forEach((gap, i) => {
      const ceiling = Math.min(24 * HOUR, HOUR * 2 ** i);
      expect(gap).toBeGreaterThanOrEqual(ceiling / 2);
      expect(gap).toBeLessThanOrEqual(ceiling + 1000);
    });
    await runner.stop();
  });

  it('fails for good on an error that is not transient, and at once on a PermanentTaskError', async () => {
    const { runner } = setUp();
    const runs: string[] = [];
    runner.register('demo.broken', (t) => (runs.push(t.key), Promise.reject(new Error('bad input'))), { concurrency: 1, maxAttempts: 2 });
    runner.register('demo.refused', (t) => (runs.push(t.key), Promise.reject(new PermanentTaskError('550 no such user'))), { concurrency: 1 });
    runner.start();
    runner.enqueue({ kind: 'demo.broken', key: 'b', shopId: 1 });
    runner.enqueue({ kind: 'demo.refused', key: 'r', shopId: 1 });
    await vi.advanceTimersByTimeAsync(30 * 24 * HOUR);
    expect(runs.sort()).toEqual(['b', 'b', 'r']);
    expect(runner.status('demo.broken', 'b')).toMatchObject({ state: 'failed', attempts: 2, nextRunAt: null });
    expect(runner.status('demo.refused', 'r')).toMatchObject({ state: 'failed', attempts: 1, nextRunAt: null, lastError: '550 no such user' });
    await runner.stop();
  });

  it("uses the kind's own first delay, and a manager's retry runs failed work at once with fresh attempts", async () => {
    const { runner } = setUp();
    const at: number[] = [];
    let broken = true;
    runner.register(
      'demo.quick',
      () => {
        at.push(Date.now());
        return broken ? Promise.reject(new Error('render failed')) : Promise.resolve();
      },
      { concurrency: 1, maxAttempts: 2, backoffBaseMs: 100 },
    );
    runner.start();
    runner.enqueue({ kind: 'demo.quick', key: 'q', shopId: 1 });
    await vi.advanceTimersByTimeAsync(1000);
    expect(at[1] - at[0]).toBeGreaterThanOrEqual(50);
    expect(at[1] - at[0]).toBeLessThanOrEqual(100);
    const [failed] = runner.failed(1);
    expect(failed).toMatchObject({ key: 'q', state: 'failed', attempts: 2 });
    expect(runner.retry(2, failed.id)).toBe(false); // another shop's task
    broken = false;
    expect(runner.retry(1, failed.id)).toBe(true);
    await vi.advanceTimersByTimeAsync(100);
    expect(runner.status('demo.quick', 'q')).toMatchObject({ state: 'done', attempts: 1 });
    expect(runner.retry(1, failed.id)).toBe(false); // done, nothing to retry
    await runner.stop();
  });
});
