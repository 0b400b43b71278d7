import { Logger } from '@nestjs/common';
import { ERRORS, type Lock, type Locker, type RequestRelease } from '@tus/utils';
import { randomBytes } from 'node:crypto';
import type { Subscription } from 'rxjs';
import type { LiveUpdates } from '../../core/events';
import type { RedisConnections } from './redis-connections';

export interface TusLockTimes {
  /** How long a waiting request tries before tus answers it 500 "failed to acquire lock" (ms; tus's own default 30 s). */
  acquireMs: number;
  /** The key's life; renewed every third of it while the holder runs, so a killed process frees it within this (ms). */
  ttlMs: number;
  /** How often a waiter tries again (ms). */
  retryMs: number;
}

const DEFAULT_TIMES: TusLockTimes = { acquireMs: 30_000, ttlMs: 15_000, retryMs: 50 };

/** Deletes or extends the key only while it still holds this lock's token. */
const UNLOCK = "if redis.call('get', KEYS[1]) == ARGV[1] then return redis.call('del', KEYS[1]) else return 0 end";
const RENEW = "if redis.call('get', KEYS[1]) == ARGV[1] then return redis.call('pexpire', KEYS[1], ARGV[2]) else return 0 end";

/**
 * tus upload locks across API processes (@tus/server's Locker interface; its MemoryLocker holds them per
 * process). A lock is `SET <prefix>:tus-lock:<upload> <token> NX PX ttl`, renewed while held. A request
 * that finds the upload locked asks the holder to let go, as MemoryLocker does, through a live-updates
 * topic (Redis pub/sub): tus then cancels the holder's request (a client resuming after a dropped
 * connection must not wait for the dead one), and the waiter takes the lock once it is free.
 */
export class RedisTusLocker implements Locker {
  readonly times: TusLockTimes;

  constructor(
    readonly redis: RedisConnections,
    readonly live: LiveUpdates,
    times: Partial<TusLockTimes> = {},
  ) {
    this.times = { ...DEFAULT_TIMES, ...times };
  }

  newLock(id: string): Lock {
    return new RedisTusLock(this, id);
  }
}

class RedisTusLock implements Lock {
  private readonly logger = new Logger('TusLock');
  private readonly token = randomBytes(12).toString('hex');
  private renewal: NodeJS.Timeout | null = null;
  private releaseAsked: Subscription | null = null;

  constructor(
    private readonly locker: RedisTusLocker,
    private readonly id: string,
  ) {}

  async lock(stopSignal: AbortSignal, requestRelease: RequestRelease): Promise<void> {
    const { acquireMs, retryMs } = this.locker.times;
    const end = Date.now() + acquireMs;
    let asked = false;
    while (!(await this.tryTake())) {
      if (stopSignal.aborted || Date.now() >= end) throw Object.assign(new Error(ERRORS.ERR_LOCK_TIMEOUT.body), ERRORS.ERR_LOCK_TIMEOUT);
      if (!asked) this.locker.live.publish(this.topic(), { from: this.token });
      asked = true;
      await new Promise((ok) => setTimeout(ok, retryMs));
    }
    this.releaseAsked = this.locker.live.subscribe<{ from: string }>(this.topic()).subscribe((m) => {
      if (m.from !== this.token) void Promise.resolve(requestRelease()).catch(() => undefined);
    });
    this.renewal = setInterval(() => void this.renew(), Math.max(100, Math.floor(this.locker.times.ttlMs / 3)));
    this.renewal.unref();
  }

  async unlock(): Promise<void> {
    if (this.renewal) clearInterval(this.renewal);
    this.releaseAsked?.unsubscribe();
    this.renewal = null;
    this.releaseAsked = null;
    await this.locker.redis.main.eval(UNLOCK, 1, this.key(), this.token);
  }

  private async tryTake(): Promise<boolean> {
    return (await this.locker.redis.main.set(this.key(), this.token, 'PX', this.locker.times.ttlMs, 'NX')) === 'OK';
  }

  private async renew(): Promise<void> {
    try {
      await this.locker.redis.main.eval(RENEW, 1, this.key(), this.token, String(this.locker.times.ttlMs));
    } catch (err) {
      this.logger.warn(`renew ${this.id}: ${(err as Error).message}`);
    }
  }

  private key(): string {
    return this.locker.redis.key('tus-lock', this.id);
  }

  private topic(): string {
    return `tus-lock:${this.id}`;
  }
}
