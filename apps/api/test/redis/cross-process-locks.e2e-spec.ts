import { Logger } from '@nestjs/common';
import type Database from 'better-sqlite3';
import { DbMaintenance } from '../../src/core/db/db.module';
import { RedisLiveUpdates } from '../../src/infra/live';
import { RedisConnections, RedisTickGate, RedisTusLocker } from '../../src/infra/redis';
import { describeRedis, freshPrefix, REDIS_URL, sleep } from './redis-suite';

// What was per process with WEB_CONCURRENCY>1: tus upload locks, and the periodic upkeep of @nestjs/schedule.
describeRedis('locks and ticks across API processes', () => {
  const opened: RedisConnections[] = [];
  beforeAll(() => Logger.overrideLogger(false));
  afterEach(async () => {
    for (const r of opened.splice(0)) await r.close();
  });

  /** Each call is one more "process": its own connections, under the same deployment prefix. */
  function deployment() {
    const prefix = freshPrefix();
    return () => {
      const redis = new RedisConnections(REDIS_URL!, prefix);
      opened.push(redis);
      return redis;
    };
  }

  describe('tus upload locks (RedisTusLocker)', () => {
    const times = { acquireMs: 3_000, ttlMs: 600, retryMs: 20 };
    const lockerOn = (redis: RedisConnections, t = times) => new RedisTusLocker(redis, new RedisLiveUpdates(redis), t);

    it('a PATCH on one process waits for the lock held on the other, asks the holder to let go, and gets it once released', async () => {
      const proc = deployment();
      const [a, b] = [lockerOn(proc()), lockerOn(proc())];
      const held = a.newLock('upload-1');
      let askedToRelease = 0;
      await held.lock(new AbortController().signal, () => void askedToRelease++);
      await sleep(50); // the holder's release subscription reaches Redis
      let gotIt = false;
      const waiting = b
        .newLock('upload-1')
        .lock(new AbortController().signal, () => undefined)
        .then(() => (gotIt = true));
      await sleep(300);
      expect(gotIt).toBe(false);
      expect(askedToRelease).toBe(1);
      await held.unlock();
      await waiting;
      expect(gotIt).toBe(true);
      // Another upload was never blocked.
      await a.newLock('upload-2').lock(new AbortController().signal, () => undefined);
    });

    it('a holder that stops answering (its process died) frees the lock within its time to live, not never', async () => {
      const proc = deployment();
      const dying = proc();
      await lockerOn(dying)
        .newLock('upload-3')
        .lock(new AbortController().signal, () => undefined);
      dying.main.disconnect(); // no more renewals, no unlock
      const t0 = Date.now();
      await lockerOn(proc())
        .newLock('upload-3')
        .lock(new AbortController().signal, () => undefined);
      expect(Date.now() - t0).toBeGreaterThanOrEqual(300);
      expect(Date.now() - t0).toBeLessThan(times.acquireMs);
    });

    it('a lock renewed by a live holder is never taken, and the waiter gives up with tus’s lock timeout', async () => {
      const proc = deployment();
      await lockerOn(proc())
        .newLock('upload-4')
        .lock(new AbortController().signal, () => undefined);
      const waiter = lockerOn(proc(), { ...times, acquireMs: 1_500 }).newLock('upload-4');
      await expect(waiter.lock(new AbortController().signal, () => undefined)).rejects.toMatchObject({
        status_code: 500,
        body: 'failed to acquire lock before timeout',
      });
    });
  });

  describe('periodic work (RedisTickGate)', () => {
    it('two processes ticking together run PRAGMA optimize once; the next period runs it again', async () => {
      const proc = deployment();
      let optimized = 0;
      const sqlite = { open: true, pragma: () => void optimized++ } as unknown as Database.Database;
      const processes = [new DbMaintenance({ sqlite }, new RedisTickGate(proc())), new DbMaintenance({ sqlite }, new RedisTickGate(proc()))];
      await Promise.all(processes.map((p) => p.optimize()));
      expect(optimized).toBe(1);
      await Promise.all(processes.map((p) => p.optimize()));
      expect(optimized).toBe(1); // still the same period (3 h)
    });

    it('claims once per period whichever process ticks, and again once 90 % of the period has passed', async () => {
      const proc = deployment();
      const gates = [new RedisTickGate(proc()), new RedisTickGate(proc()), new RedisTickGate(proc())];
      const first = await Promise.all(gates.map((g) => g.claim('storage-sweep', 500)));
      expect(first.filter(Boolean)).toHaveLength(1);
      expect(await gates[0].claim('storage-sweep', 500)).toBe(false);
      expect(await gates[1].claim('sqlite-optimize', 500)).toBe(true); // another job is its own tick
      await sleep(500);
      const next = await Promise.all(gates.map((g) => g.claim('storage-sweep', 500)));
      expect(next.filter(Boolean)).toHaveLength(1);
    });
  });
});
