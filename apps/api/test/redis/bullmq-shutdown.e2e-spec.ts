import { Logger } from '@nestjs/common';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { systemClock } from '../../src/core/clock';
import { openDb } from '../../src/core/db';
import { RedisConnections } from '../../src/infra/redis';
import { BullMqTaskRunner, TaskStore } from '../../src/infra/tasks';
import { describeRedis, freshPrefix, REDIS_URL, sleep } from './redis-suite';

// The shutdown promises of infra/tasks/sqlite-task-runner.shutdown.spec.ts, kept by the BullMQ driver.
describeRedis('BullMqTaskRunner shutdown', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-bullmq-stop-'));
  const closers: (() => Promise<void>)[] = [];
  beforeAll(() => Logger.overrideLogger(false));
  afterEach(async () => {
    for (const close of closers.splice(0)) await close();
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  // A long lease (30 s): a task that comes back sooner was released, not taken back as stalled.
  const SEC = 1000;
  const OPTIONS = { pollMs: 200, leaseMs: 30 * SEC, maxAttempts: 5 } as const;
  const backoffs = { backoff: { baseMs: SEC, maxMs: SEC }, longBackoff: { baseMs: 3600 * SEC, maxMs: 86_400 * SEC } };

  /** One database and one queue prefix; each call makes another "process" on them. */
  function shared() {
    const { db, sqlite } = openDb(join(dir, `${freshPrefix()}.sqlite`));
    const prefix = freshPrefix();
    closers.push(() => {
      sqlite.close();
      return Promise.resolve();
    });
    return () => {
      const redis = new RedisConnections(REDIS_URL!, prefix);
      const runner = new BullMqTaskRunner(new TaskStore(db), redis, systemClock, { ...OPTIONS, ...backoffs }, db);
      closers.unshift(async () => {
        await runner.stop(0);
        await redis.close();
      });
      return runner;
    };
  }

  function started(): { mark: () => void; seen: Promise<void> } {
    let mark!: () => void;
    const seen = new Promise<void>((ok) => (mark = ok));
    return { mark, seen };
  }

  it('waits for a task that finishes within the grace, and leaves it done', async () => {
    const runner = shared()();
    const go = started();
    runner.register('demo.slow', () => (go.mark(), sleep(300)), { concurrency: 1 });
    runner.start();
    runner.enqueue({ kind: 'demo.slow', key: 'a', shopId: null });
    await go.seen;
    await runner.stop(10_000);
    expect(runner.status('demo.slow', 'a')).toMatchObject({ state: 'done', attempts: 1 });
  });

  it('releases a task still running after the grace: queued again at once, the cut attempt not counted, done by another process', async () => {
    const spawn = shared();
    const first = spawn();
    const go = started();
    let finish!: () => void;
    first.register('demo.stuck', () => (go.mark(), new Promise<void>((ok) => (finish = ok))), { concurrency: 1 });
    first.start();
    first.enqueue({ kind: 'demo.stuck', key: 'b', shopId: null });
    await go.seen;
    const t0 = Date.now();
    await first.stop(200);
    expect(Date.now() - t0).toBeLessThan(5_000);
    expect(first.status('demo.stuck', 'b')).toMatchObject({ state: 'queued', attempts: 0 });
    // The cut-short handler finishing late changes nothing: the row is no longer its own.
    finish();
    await sleep(50);
    expect(first.status('demo.stuck', 'b')?.state).toBe('queued');
    // Another process takes it well before the 30 s lock of the first would have lapsed.
    const second = spawn();
    const runs: string[] = [];
    second.register('demo.stuck', (t) => (runs.push(t.key), Promise.resolve()), { concurrency: 1 });
    second.start();
    const t1 = Date.now();
    await second.settled();
    expect(Date.now() - t1).toBeLessThan(10_000);
    expect(runs).toEqual(['b']);
    expect(second.status('demo.stuck', 'b')).toMatchObject({ state: 'done', attempts: 1 });
  });
});
