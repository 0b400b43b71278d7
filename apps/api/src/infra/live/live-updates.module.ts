import { Global, Module } from '@nestjs/common';
import { type MaybeRedis, REDIS } from '../redis';
import { InProcessLiveUpdates } from './in-process.live-updates';
import { LIVE_UPDATES, type LiveUpdates } from '../../core/events';
import { RedisLiveUpdates } from './redis.live-updates';

/** LIVE_UPDATES: Redis pub/sub when REDIS_URL is set (several processes), else in this process. */
@Global()
@Module({
  providers: [
    {
      provide: LIVE_UPDATES,
      inject: [REDIS],
      useFactory: (redis: MaybeRedis): LiveUpdates => (redis ? new RedisLiveUpdates(redis) : new InProcessLiveUpdates()),
    },
  ],
  exports: [LIVE_UPDATES],
})
export class LiveUpdatesModule {}
