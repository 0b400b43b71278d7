import { Logger } from '@nestjs/common';
import type { TaskHandler, TaskKindOptions, TaskRunner, TaskSpec, TaskStatus } from './tasks.port';

/**
 * Interim in-process runner behind the TaskRunner port (not durable; replaced by the
 * SQLite runner). Same contract: idempotent by (kind, key), a concurrency limit per kind.
 */
export class MemoryTaskRunner implements TaskRunner {
  private readonly logger = new Logger('TaskRunner');
  private readonly kinds = new Map<string, { handler: TaskHandler; options: TaskKindOptions; running: number }>();
  private readonly tasks = new Map<string, TaskStatus & { spec: TaskSpec }>();
  private waiters: (() => void)[] = [];

  register(kind: string, handler: TaskHandler, options: TaskKindOptions): void {
    this.kinds.set(kind, { handler, options, running: 0 });
    this.pump();
  }

  enqueue(spec: TaskSpec): void {
    const id = `${spec.kind}:${spec.key}`;
    const existing = this.tasks.get(id);
    if (existing && existing.state !== 'failed') return;
    this.tasks.set(id, { kind: spec.kind, key: spec.key, state: 'queued', attempts: 0, lastError: null, progress: 0, nextRunAt: null, spec });
    queueMicrotask(() => this.pump());
  }

  status(kind: string, key: string): TaskStatus | null {
    const t = this.tasks.get(`${kind}:${key}`);
    if (!t) return null;
    const { spec: _spec, ...status } = t;
    return status;
  }

  settled(): Promise<void> {
    if (!this.busy()) return Promise.resolve();
    return new Promise((resolve) => this.waiters.push(resolve));
  }

  private busy(): boolean {
    return [...this.tasks.values()].some((t) => (t.state === 'queued' && this.kinds.has(t.kind)) || t.state === 'running');
  }

  private pump(): void {
    for (const task of this.tasks.values()) {
      const kind = this.kinds.get(task.kind);
      if (task.state !== 'queued' || !kind || kind.running >= kind.options.concurrency) continue;
      kind.running++;
      task.state = 'running';
      task.attempts++;
      const ctx = { kind: task.kind, key: task.key, shopId: task.spec.shopId, payload: task.spec.payload ?? {}, attempt: task.attempts, progress: (f: number) => (task.progress = f) };
      void kind.handler(ctx).then(
        () => (task.state = 'done'),
        (err: unknown) => {
          task.state = 'failed';
          task.lastError = err instanceof Error ? err.message : String(err);
          this.logger.error(`${task.kind}:${task.key} failed: ${task.lastError}`);
        },
      ).finally(() => {
        kind.running--;
        this.pump();
        if (!this.busy()) for (const w of this.waiters.splice(0)) w();
      });
    }
  }
}
