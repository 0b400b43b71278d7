import { Global, Inject, Module, type OnApplicationShutdown } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config';
import { everyTick, TICK_GATE, type TickGate } from '../../core/schedule';
import { type MaybeRedis, REDIS, RedisConnections } from './redis-connections';
import { RedisTickGate } from './redis-tick-gate';

/**
 * REDIS: this process's connections when REDIS_URL is set, else null. Closed last, after the task workers stop.
 * TICK_GATE: periodic work once across processes (a Redis claim per tick), or every tick with one process.
 */
@Global()
@Module({
  providers: [
    {
      provide: REDIS,
      inject: [APP_CONFIG],
      useFactory: (cfg: AppConfig): MaybeRedis => (cfg.REDIS_URL ? new RedisConnections(cfg.REDIS_URL, cfg.REDIS_PREFIX) : null),
    },
    { provide: TICK_GATE, inject: [REDIS], useFactory: (redis: MaybeRedis): TickGate => (redis ? new RedisTickGate(redis) : everyTick) },
  ],
  exports: [REDIS, TICK_GATE],
})
export class RedisModule implements OnApplicationShutdown {
  constructor(@Inject(REDIS) private readonly redis: MaybeRedis) {}

  async onApplicationShutdown(): Promise<void> {
    await this.redis?.close();
  }
}
