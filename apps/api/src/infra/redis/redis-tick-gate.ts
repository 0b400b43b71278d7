import { Logger } from '@nestjs/common';
import { claimMs, type TickGate } from '../../core/schedule';
import type { RedisConnections } from './redis-connections';

/** TickGate on Redis: `SET <prefix>:tick:<name> <pid> NX PX <0.9 period>`; the process that sets it does the tick's work. */
export class RedisTickGate implements TickGate {
  private readonly logger = new Logger('TickGate');

  constructor(private readonly redis: RedisConnections) {}

  async claim(name: string, periodMs: number): Promise<boolean> {
    try {
      return (await this.redis.main.set(this.redis.key('tick', name), String(process.pid), 'PX', claimMs(periodMs), 'NX')) === 'OK';
    } catch (err) {
      // Redis down: better to run the upkeep in every process than in none (each piece is safe to repeat).
      this.logger.warn(`${name}: ${(err as Error).message}; running this tick here`);
      return true;
    }
  }
}
