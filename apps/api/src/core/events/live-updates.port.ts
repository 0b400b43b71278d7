import type { Observable } from 'rxjs';

/**
 * Live updates to open staff screens (Server-Sent Events): a message published on a topic reaches
 * every subscriber of that topic in every API process. Best effort by design: a screen that was not
 * listening reloads what it shows; nothing durable travels here (that is the task runner's job).
 * Topics are built by the publishing feature, e.g. `owner:<shopId>:<jobId>`.
 */
export interface LiveUpdates {
  publish(topic: string, message: object): void;
  /** Messages of one topic from now on; unsubscribing (the SSE response closing) frees the topic. */
  subscribe<T extends object>(topic: string): Observable<T>;
}

export const LIVE_UPDATES = Symbol('LIVE_UPDATES');
