import { EventEmitter } from 'node:events';
import { fromEvent, type Observable } from 'rxjs';
import type { LiveUpdates } from '../../core/events';

/** One process (the embedded default): topics are events of one emitter. */
export class InProcessLiveUpdates implements LiveUpdates {
  private readonly emitter = new EventEmitter().setMaxListeners(0);

  publish(topic: string, message: object): void {
    this.emitter.emit(topic, message);
  }

  subscribe<T extends object>(topic: string): Observable<T> {
    return fromEvent(this.emitter, topic) as Observable<T>;
  }
}
