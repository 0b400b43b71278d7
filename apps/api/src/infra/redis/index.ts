export { REDIS, RedisConnections, type MaybeRedis } from './redis-connections';
export { RedisModule } from './redis.module';
export { createRateLimiter } from './rate-limiter';
export { RedisThrottlerStorage, sharedThrottlerModule } from './redis-throttler.storage';
