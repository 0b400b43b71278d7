import { Logger } from '@nestjs/common';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { systemClock } from '../../src/core/clock';
import { openDb } from '../../src/core/db';
import { RedisConnections } from '../../src/infra/redis';
import { BullMqTaskRunner, PermanentTaskError, TaskStore } from '../../src/infra/tasks';
import type { RawTaskContext } from '../../src/infra/tasks';
import { describeRedis, freshPrefix, REDIS_URL } from './redis-suite';

// The runner's promises of infra/tasks/sqlite-task-runner.spec.ts, kept by the BullMQ driver (TASKS=redis).
describeRedis('BullMqTaskRunner', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-bullmq-'));
  const open: { runner: BullMqTaskRunner; redis: RedisConnections; close: () => void }[] = [];
  beforeAll(() => Logger.overrideLogger(false));
  afterEach(async () => {
    for (const o of open.splice(0)) {
      await o.runner.stop();
      await o.redis.close();
      o.close();
    }
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  function setUp(backoffMs = 1000) {
    const { db, sqlite } = openDb(join(dir, `${freshPrefix()}.sqlite`));
    sqlite.pragma('foreign_keys = OFF'); // made-up shop ids for the manager's failed list, no shops table rows
    const redis = new RedisConnections(REDIS_URL!, freshPrefix());
    const opts = {
      pollMs: 200,
      leaseMs: 5000,
      backoff: { baseMs: backoffMs, maxMs: backoffMs },
      longBackoff: { baseMs: 3_600_000, maxMs: 86_400_000 },
      maxAttempts: 5,
    };
    const runner = new BullMqTaskRunner(new TaskStore(db), redis, systemClock, opts, db);
    open.push({ runner, redis, close: () => sqlite.close() });
    const calls: RawTaskContext[] = [];
    const record = (t: RawTaskContext) => {
      calls.push(t);
      return Promise.resolve();
    };
    return { db, runner, calls, record };
  }

  it('never runs a task enqueued in a transaction that rolled back, and runs the committed one', async () => {
    const { db, runner, calls, record } = setUp();
    runner.register('demo.work', record, { concurrency: 1 });
    runner.start();
    expect(() =>
      db.transaction((tx) => {
        runner.enqueue({ kind: 'demo.work', key: 'rolled-back', shopId: null }, tx);
        throw new Error('the change failed');
      }),
    ).toThrow('the change failed');
    db.transaction((tx) => runner.enqueue({ kind: 'demo.work', key: 'committed', shopId: null, payload: { n: 1 } }, tx));
    await runner.settled();
    expect(calls.map((c) => [c.key, c.payload])).toEqual([['committed', { n: 1 }]]);
    expect(runner.status('demo.work', 'rolled-back')).toBeNull();
    expect(runner.status('demo.work', 'committed')).toMatchObject({ state: 'done', attempts: 1, progress: 1 });
    expect(runner.health()).toMatchObject({ ok: true, driver: 'redis' });
  });

  it('runs the same (kind, key) once however often it is enqueued', async () => {
    const { runner, calls, record } = setUp();
    runner.register('demo.work', record, { concurrency: 2 });
    runner.start();
    runner.enqueue({ kind: 'demo.work', key: 'asset-7', shopId: null, payload: { n: 1 } });
    runner.enqueue({ kind: 'demo.work', key: 'asset-7', shopId: null, payload: { n: 2 } });
    await runner.settled();
    runner.enqueue({ kind: 'demo.work', key: 'asset-7', shopId: null, payload: { n: 3 } });
    await runner.settled();
    expect(calls.map((c) => c.payload)).toEqual([{ n: 1 }]);
  });

  it('never runs more tasks of a kind at once than its concurrency', async () => {
    const { runner } = setUp();
    let running = 0;
    let peak = 0;
    const slow = async () => {
      peak = Math.max(peak, ++running);
      await new Promise((r) => setTimeout(r, 30));
      running--;
    };
    runner.register('demo.slow', slow, { concurrency: 2 });
    runner.start();
    for (let i = 0; i < 6; i++) runner.enqueue({ kind: 'demo.slow', key: `k${i}`, shopId: null });
    await runner.settled();
    expect(peak).toBe(2);
    expect(['k0', 'k5'].map((k) => runner.status('demo.slow', k)?.state)).toEqual(['done', 'done']);
  });

  it('retries on the backoff until maxAttempts, ends failed with the last error, and a new enqueue queues it afresh', async () => {
    const { runner } = setUp(50);
    let fail = true;
    const attempts: number[] = [];
    const flaky = (t: RawTaskContext) => {
      attempts.push(t.attempt);
      return fail ? Promise.reject(new Error(`disk full on try ${t.attempt}`)) : Promise.resolve();
    };
    runner.register('demo.flaky', flaky, { concurrency: 1, maxAttempts: 3 });
    runner.start();
    runner.enqueue({ kind: 'demo.flaky', key: 'x', shopId: 1 });
    await runner.settled();
    expect(attempts).toEqual([1, 2, 3]);
    expect(runner.status('demo.flaky', 'x')).toMatchObject({ state: 'failed', attempts: 3, lastError: 'disk full on try 3' });
    expect(runner.failed(1).map((f) => f.key)).toEqual(['x']);
    fail = false;
    runner.enqueue({ kind: 'demo.flaky', key: 'x', shopId: 1 });
    await runner.settled();
    expect(runner.status('demo.flaky', 'x')).toMatchObject({ state: 'done', attempts: 1, lastError: null });
  });

  it('fails at once on a PermanentTaskError, and a manager retry runs it again with fresh attempts', async () => {
    const { runner } = setUp(50);
    let calls = 0;
    runner.register('demo.refused', () => (++calls === 1 ? Promise.reject(new PermanentTaskError('recipient refused')) : Promise.resolve()), {
      concurrency: 1,
      maxAttempts: 5,
    });
    runner.start();
    runner.enqueue({ kind: 'demo.refused', key: 'm1', shopId: 4 });
    await runner.settled();
    expect(runner.status('demo.refused', 'm1')).toMatchObject({ state: 'failed', attempts: 1, lastError: 'recipient refused' });
    const [failed] = runner.failed(4);
    expect(runner.retry(4, failed.id)).toBe(true);
    await runner.settled();
    expect(calls).toBe(2);
    expect(runner.status('demo.refused', 'm1')?.state).toBe('done');
  });
});
