import { Logger } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import { hostname } from 'node:os';
import type { Clock } from '../../core/clock';
import { type BackoffOptions, retryDelay } from './backoff';
import { isTransientError, PermanentTaskError } from './task-errors';
import { type TaskRow, type TaskStore, toStatus } from './task-store';
import type { DbTx } from '../../core/db';
import type { FailedTask, RawTaskContext, RawTaskSpec, TaskHandlerFn, TaskKindOptions, TaskRunner, TaskRunnerHealth, TaskStatus } from './tasks.port';

export interface SqliteRunnerOptions {
  /** How often to look for work enqueued by another process or freed by an expired lease (ms). */
  pollMs: number;
  /** How long a claim holds without renewal; a killed process's tasks run again after this (ms). */
  leaseMs: number;
  backoff: BackoffOptions;
  /** After the last quick attempt, a transient failure (see isTransientError) is tried again on this backoff (capped at a day). */
  longBackoff: BackoffOptions;
  /** Attempts before a task ends failed, unless its kind says otherwise. */
  maxAttempts: number;
  random?: () => number;
}

interface Kind {
  handler: TaskHandlerFn;
  options: TaskKindOptions;
  running: number;
}

/**
 * The durable runner: tasks are rows of the `tasks` table (an outbox written in the caller's
 * transaction), claimed under a lease, retried with backoff, limited per kind. Wakes at once
 * on enqueue, at the next retry time, and at least every `pollMs`.
 */
export class SqliteTaskRunner implements TaskRunner {
  private readonly logger = new Logger('TaskRunner');
  private readonly owner = `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;
  private readonly kinds = new Map<string, Kind>();
  private readonly inflight = new Set<Promise<void>>();
  private waiters: (() => void)[] = [];
  private timer: NodeJS.Timeout | null = null;
  private wakePending = false;
  private state: 'idle' | 'started' | 'stopped' = 'idle';
  private lastPollAt: Date | null = null;
  private lastPollFailed = false;
  private stopping: Promise<void> | null = null;

  constructor(
    private readonly store: TaskStore,
    private readonly clock: Clock,
    private readonly opts: SqliteRunnerOptions,
  ) {}

  /** Kinds are plain strings here, so the driver's own tests can use made-up kinds. */
  register(kind: string, handler: TaskHandlerFn, options: TaskKindOptions): void {
    if (this.kinds.has(kind)) throw new Error(`Task kind ${kind} already has a handler`);
    this.kinds.set(kind, { handler, options, running: 0 });
    this.wake();
  }

  enqueue(spec: RawTaskSpec, tx?: DbTx): void {
    this.store.insert(spec, this.clock.now(), tx);
    // After the caller's (synchronous) transaction has committed or rolled back.
    this.wake();
  }

  status(kind: string, key: string): TaskStatus | null {
    const row = this.store.find(kind, key);
    return row ? toStatus(row) : null;
  }

  settled(): Promise<void> {
    if (!this.busy()) return Promise.resolve();
    return new Promise((resolve) => this.waiters.push(resolve));
  }

  health(): TaskRunnerHealth {
    const counts = this.store.counts();
    return { ok: this.state === 'started' && !this.lastPollFailed, driver: 'sqlite', lastPollAt: this.lastPollAt?.toISOString() ?? null, counts };
  }

  prune(before: Date): number {
    return this.store.prune(before);
  }

  failed(shopId: number): FailedTask[] {
    return this.store.failedFor(shopId).map((r) => ({ ...toStatus(r), id: r.id, shopId: r.shopId, updatedAt: r.updatedAt.toISOString() }));
  }

  retry(shopId: number, id: number): boolean {
    const queued = this.store.requeue(shopId, id, this.clock.now());
    if (queued) this.wake();
    return queued;
  }

  /** Begins taking work (after every handler has registered). */
  start(): void {
    if (this.state !== 'idle') return;
    this.state = 'started';
    this.wake();
  }

  /** Takes no new work and waits for what this process is running; after `graceMs`, releases the leases of what still runs. */
  stop(graceMs = Infinity): Promise<void> {
    this.stopping ??= this.drain(graceMs);
    return this.stopping;
  }

  private async drain(graceMs: number): Promise<void> {
    this.state = 'stopped';
    if (this.timer) clearTimeout(this.timer);
    let timer: NodeJS.Timeout | undefined;
    const graceOver = new Promise<'over'>((ok) => {
      if (Number.isFinite(graceMs)) timer = setTimeout(() => ok('over'), graceMs);
    });
    const finished = await Promise.race([Promise.allSettled([...this.inflight]), graceOver]);
    clearTimeout(timer);
    if (finished === 'over') {
      let released = 0;
      this.safely(() => (released = this.store.release(this.owner, this.clock.now())));
      this.logger.warn(`Shutdown: ${released} running task(s) did not finish within ${graceMs} ms; released for the next process`);
    }
    for (const w of this.waiters.splice(0)) w();
  }

  private wake(): void {
    if (this.state !== 'started' || this.wakePending) return;
    this.wakePending = true;
    setImmediate(() => {
      this.wakePending = false;
      this.tick();
    });
  }

  private tick(): void {
    if (this.state !== 'started') return;
    if (this.timer) clearTimeout(this.timer);
    const now = this.clock.now();
    try {
      for (const [name, kind] of this.kinds) {
        for (const row of this.store.claim(name, kind.options.concurrency - kind.running, this.owner, now, this.opts.leaseMs)) this.run(kind, row);
      }
      this.lastPollAt = now;
      this.lastPollFailed = false;
    } catch (err) {
      this.lastPollFailed = true;
      this.logger.error(`Task poll failed: ${(err as Error).message}`);
    }
    this.schedule(now);
    this.notifyIfIdle();
  }

  /** Sleeps until the next retry falls due, or one poll interval, whichever is sooner. */
  private schedule(now: Date): void {
    const free = [...this.kinds].filter(([, k]) => k.running < k.options.concurrency).map(([name]) => name);
    let wait = this.opts.pollMs;
    try {
      const due = this.store.nextDue(free);
      if (due) wait = Math.min(wait, Math.max(10, due.getTime() - now.getTime()));
    } catch {
      // The poll below retries; a closed database shows in health().
    }
    this.timer = setTimeout(() => this.tick(), wait);
    this.timer.unref();
  }

  private run(kind: Kind, row: TaskRow): void {
    kind.running++;
    const { leaseMs } = this.opts;
    const heartbeat = setInterval(() => this.safely(() => this.store.renew(row.id, this.owner, new Date(this.clock.now().getTime() + leaseMs))), leaseMs / 3);
    heartbeat.unref();
    const ctx: RawTaskContext = {
      kind: row.kind,
      key: row.key,
      shopId: row.shopId,
      payload: row.payload,
      attempt: row.attempts,
      final: row.attempts >= this.maxAttempts(kind),
      progress: (f: number) => this.safely(() => this.store.progress(row.id, this.owner, f)),
    };
    const done: Promise<void> = Promise.resolve()
      .then(() => kind.handler(ctx))
      .then(
        () => this.safely(() => this.store.finish(row.id, this.owner, this.clock.now())),
        (err: unknown) => this.safely(() => this.recordFailure(kind, row, err)),
      )
      .finally(() => {
        clearInterval(heartbeat);
        kind.running--;
        this.inflight.delete(done);
        this.wake();
        this.notifyIfIdle();
      });
    this.inflight.add(done);
  }

  private maxAttempts(kind: Kind): number {
    return kind.options.maxAttempts ?? this.opts.maxAttempts;
  }

  /**
   * Quick retries (the kind's backoff) up to maxAttempts; then failed, and a transient error
   * (full disk, lost connection, timeout) is taken again on the long backoff, so work stopped by a
   * full disk comes back by itself. A PermanentTaskError fails at once.
   */
  private recordFailure(kind: Kind, row: TaskRow, err: unknown): void {
    const message = err instanceof Error ? err.message : String(err);
    const max = this.maxAttempts(kind);
    const now = this.clock.now().getTime();
    const permanent = err instanceof PermanentTaskError;
    const backoff = { ...this.opts.backoff, baseMs: kind.options.backoffBaseMs ?? this.opts.backoff.baseMs };
    const retryAt = !permanent && row.attempts < max ? new Date(now + retryDelay(row.attempts, backoff, this.opts.random)) : null;
    const later = !retryAt && isTransientError(err) ? new Date(now + retryDelay(row.attempts - max + 1, this.opts.longBackoff, this.opts.random)) : null;
    this.store.fail(row.id, this.owner, new Date(now), message, retryAt, later);
    const next = retryAt ? `; retry at ${retryAt.toISOString()}` : later ? `; transient, again at ${later.toISOString()}` : '; giving up';
    this.logger.warn(`${row.kind}:${row.key} attempt ${row.attempts} failed (${message})${next}`);
  }

  /** Store writes after a handler must not crash the process (e.g. the database closing in a test). */
  private safely(write: () => void): void {
    try {
      write();
    } catch (err) {
      this.logger.error(`Task bookkeeping failed: ${(err as Error).message}`);
    }
  }

  private busy(): boolean {
    if (this.inflight.size > 0) return true;
    try {
      return this.state !== 'stopped' && this.store.pendingCount([...this.kinds.keys()], this.clock.now()) > 0;
    } catch {
      return false;
    }
  }

  private notifyIfIdle(): void {
    if (this.waiters.length > 0 && !this.busy()) for (const w of this.waiters.splice(0)) w();
  }
}
