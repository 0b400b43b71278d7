import { Logger } from '@nestjs/common';
import type { Redis } from 'ioredis';

/**
 * The Redis connections of one API process (REDIS_URL). Commands and publishing share `main`;
 * a subscriber and each BullMQ worker need a connection of their own, made by `open`. Every key
 * and channel starts with the deployment's prefix (REDIS_PREFIX), so two deployments may share one Redis.
 */
export class RedisConnections {
  private readonly logger = new Logger('Redis');
  private readonly opened: Redis[] = [];
  readonly main: Redis;

  constructor(
    private readonly url: string,
    readonly prefix: string,
  ) {
    this.main = this.open('main');
  }

  /** A new connection; BullMQ insists on `maxRetriesPerRequest: null` for blocking commands, which suits a subscriber too. */
  open(name: string): Redis {
    // ioredis loads with the first connection (REDIS_URL set), not at every boot (issue 22).
    // eslint-disable-next-line @typescript-eslint/no-require-imports -- lazy and synchronous on purpose
    const conn = new (require('ioredis') as typeof import('ioredis')).Redis(this.url, {
      maxRetriesPerRequest: null,
      connectionName: `${this.prefix}:${name}:${process.pid}`,
      lazyConnect: false,
    });
    conn.on('error', (err: Error) => this.logger.warn(`${name}: ${err.message}`));
    this.opened.push(conn);
    return conn;
  }

  key(...parts: (string | number)[]): string {
    return [this.prefix, ...parts].join(':');
  }

  async ping(): Promise<boolean> {
    try {
      return (await this.main.ping()) === 'PONG';
    } catch {
      return false;
    }
  }

  async close(): Promise<void> {
    await Promise.allSettled(this.opened.splice(0).map((c) => c.quit().catch(() => c.disconnect())));
  }
}

export const REDIS = Symbol('REDIS');
/** What REDIS resolves to: null without REDIS_URL (everything stays in this process). */
export type MaybeRedis = RedisConnections | null;
