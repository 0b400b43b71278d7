import { Logger } from '@nestjs/common';

type Task = () => Promise<void>;

/**
 * A small in-process queue for slow work (derivatives). Keyed: a key already queued
 * or running is not added twice, so enqueueing is idempotent per entity. Tasks own
 * their error handling (they record status); a throw is only logged.
 */
export class TaskQueue {
  private readonly logger = new Logger('TaskQueue');
  private readonly waiting = new Map<string, Task>();
  private readonly running = new Set<string>();
  private idleWaiters: (() => void)[] = [];

  constructor(private readonly concurrency: number) {}

  enqueue(key: string, task: Task): boolean {
    if (this.waiting.has(key) || this.running.has(key)) return false;
    this.waiting.set(key, task);
    this.pump();
    return true;
  }

  /** Resolves once nothing is queued or running (tests and shutdown wait on this). */
  drain(): Promise<void> {
    if (this.isIdle()) return Promise.resolve();
    return new Promise((resolve) => this.idleWaiters.push(resolve));
  }

  get size(): number {
    return this.waiting.size + this.running.size;
  }

  private isIdle(): boolean {
    return this.waiting.size === 0 && this.running.size === 0;
  }

  private pump(): void {
    while (this.running.size < this.concurrency && this.waiting.size > 0) {
      const [key, task] = this.waiting.entries().next().value as [string, Task];
      this.waiting.delete(key);
      this.running.add(key);
      void this.run(key, task);
    }
  }

  private async run(key: string, task: Task): Promise<void> {
    try {
      await task();
    } catch (err) {
      this.logger.error(`Task ${key} failed: ${(err as Error).stack ?? String(err)}`);
    } finally {
      this.running.delete(key);
      this.pump();
      if (this.isIdle()) {
        const waiters = this.idleWaiters;
        this.idleWaiters = [];
        for (const w of waiters) w();
      }
    }
  }
}

export const TASK_QUEUE = Symbol('TASK_QUEUE');
