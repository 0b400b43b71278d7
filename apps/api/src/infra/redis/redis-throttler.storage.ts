import type { DynamicModule } from '@nestjs/common';
import { ThrottlerModule, type ThrottlerOptions, type ThrottlerStorage } from '@nestjs/throttler';
import { RateLimiterRes, type RateLimiterAbstract } from 'rate-limiter-flexible';
import { createRateLimiter } from './rate-limiter';
import { type MaybeRedis, REDIS, type RedisConnections } from './redis-connections';

type ThrottlerStorageRecord = Awaited<ReturnType<ThrottlerStorage['increment']>>;

/**
 * @nestjs/throttler's storage on Redis, so a per-address budget holds across every API process.
 * Counting is rate-limiter-flexible's RateLimiterRedis (one atomic command per hit), one limiter per
 * throttler setting; the throttler's record is read off its answer (times in seconds, as the guard expects).
 */
export class RedisThrottlerStorage implements ThrottlerStorage {
  private readonly limiters = new Map<string, RateLimiterAbstract>();

  constructor(private readonly redis: RedisConnections) {}

  async increment(key: string, ttl: number, limit: number, blockDuration: number, throttlerName: string): Promise<ThrottlerStorageRecord> {
    const limiter = this.limiter(throttlerName, ttl, limit, blockDuration);
    try {
      const res = await limiter.consume(key);
      return { totalHits: res.consumedPoints, timeToExpire: seconds(res.msBeforeNext), isBlocked: false, timeToBlockExpire: 0 };
    } catch (err) {
      if (!(err instanceof RateLimiterRes)) throw err;
      const wait = seconds(err.msBeforeNext);
      return { totalHits: err.consumedPoints, timeToExpire: wait, isBlocked: true, timeToBlockExpire: wait };
    }
  }

  private limiter(name: string, ttl: number, limit: number, blockDuration: number): RateLimiterAbstract {
    const id = `${name}:${ttl}:${limit}:${blockDuration}`;
    let limiter = this.limiters.get(id);
    if (!limiter) {
      limiter = createRateLimiter(this.redis, { keyPrefix: `throttle:${id}`, points: limit, duration: seconds(ttl), blockDuration: seconds(blockDuration) });
      this.limiters.set(id, limiter);
    }
    return limiter;
  }
}

const seconds = (ms: number): number => Math.max(1, Math.ceil(ms / 1000));

/** ThrottlerModule with these budgets, counted in Redis when REDIS_URL is set (else the throttler's own in-memory storage). */
export function sharedThrottlerModule(throttlers: ThrottlerOptions[]): DynamicModule {
  return ThrottlerModule.forRootAsync({
    inject: [REDIS],
    useFactory: (redis: MaybeRedis) => ({ throttlers, ...(redis ? { storage: new RedisThrottlerStorage(redis) } : {}) }),
  });
}
