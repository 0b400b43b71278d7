import { Global, Inject, Module, type OnApplicationShutdown } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config';
import { type MaybeRedis, REDIS, RedisConnections } from './redis-connections';

/** REDIS: this process's connections when REDIS_URL is set, else null. Closed last, after the task workers stop. */
@Global()
@Module({
  providers: [
    {
      provide: REDIS,
      inject: [APP_CONFIG],
      useFactory: (cfg: AppConfig): MaybeRedis => (cfg.REDIS_URL ? new RedisConnections(cfg.REDIS_URL, cfg.REDIS_PREFIX) : null),
    },
  ],
  exports: [REDIS],
})
export class RedisModule implements OnApplicationShutdown {
  constructor(@Inject(REDIS) private readonly redis: MaybeRedis) {}

  async onApplicationShutdown(): Promise<void> {
    await this.redis?.close();
  }
}
