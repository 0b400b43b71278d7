import { type IRateLimiterOptions, RateLimiterMemory, RateLimiterRedis, type RateLimiterAbstract } from 'rate-limiter-flexible';
import type { MaybeRedis } from './redis-connections';

/**
 * A rate-limiter-flexible limiter that every API process shares when Redis is configured
 * (RateLimiterRedis, counts under the deployment's prefix), else one in this process's memory.
 * A Redis outage falls back to a per-process count (the insurance limiter) rather than refusing everyone.
 */
export function createRateLimiter(redis: MaybeRedis, opts: IRateLimiterOptions & { keyPrefix: string }): RateLimiterAbstract {
  if (!redis) return new RateLimiterMemory(opts);
  return new RateLimiterRedis({
    ...opts,
    storeClient: redis.main,
    keyPrefix: redis.key('rl', opts.keyPrefix),
    insuranceLimiter: new RateLimiterMemory(opts),
  });
}
