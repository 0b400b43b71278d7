import { Logger } from '@nestjs/common';
import type { Redis } from 'ioredis';
import { Observable, type Subscriber } from 'rxjs';
import type { RedisConnections } from '../redis';
import type { LiveUpdates } from '../../core/events';

/**
 * Several processes: PUBLISH on the shared connection, one subscriber connection per process that
 * SUBSCRIBEs to a topic while at least one screen of this process listens to it, and UNSUBSCRIBEs
 * after the last one leaves. A message published by this process comes back through Redis like any
 * other, so every screen sees the same order.
 */
export class RedisLiveUpdates implements LiveUpdates {
  private readonly logger = new Logger('LiveUpdates');
  private readonly subscriber: Redis;
  private readonly listeners = new Map<string, Set<Subscriber<object>>>();

  constructor(private readonly redis: RedisConnections) {
    this.subscriber = redis.open('live');
    this.subscriber.on('message', (channel: string, raw: string) => this.deliver(channel, raw));
  }

  publish(topic: string, message: object): void {
    this.redis.main.publish(this.channel(topic), JSON.stringify(message)).catch((err: Error) => this.logger.warn(`publish ${topic}: ${err.message}`));
  }

  subscribe<T extends object>(topic: string): Observable<T> {
    const channel = this.channel(topic);
    return new Observable<T>((sub) => {
      let set = this.listeners.get(channel);
      if (!set) {
        set = new Set();
        this.listeners.set(channel, set);
        this.subscriber.subscribe(channel).catch((err: Error) => sub.error(err));
      }
      set.add(sub);
      return () => {
        set.delete(sub);
        if (set.size > 0 || this.listeners.get(channel) !== set) return;
        this.listeners.delete(channel);
        this.subscriber.unsubscribe(channel).catch(() => undefined);
      };
    });
  }

  /** Resolves once Redis has confirmed every current subscription (tests wait for it before publishing). */
  async ready(): Promise<void> {
    await this.subscriber.ping();
  }

  private deliver(channel: string, raw: string): void {
    const set = this.listeners.get(channel);
    if (!set) return;
    let message: object;
    try {
      message = JSON.parse(raw) as object;
    } catch {
      return;
    }
    for (const sub of set) sub.next(message);
  }

  private channel(topic: string): string {
    return this.redis.key('live', topic);
  }
}
