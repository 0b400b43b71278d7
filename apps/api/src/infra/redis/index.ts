export { REDIS, RedisConnections, type MaybeRedis } from './redis-connections';
export { RedisModule } from './redis.module';
export { createRateLimiter } from './rate-limiter';
export { RedisThrottlerStorage, sharedThrottlerModule } from './redis-throttler.storage';
export { RedisTickGate } from './redis-tick-gate';
export { RedisTusLocker } from './redis-tus-locker';
