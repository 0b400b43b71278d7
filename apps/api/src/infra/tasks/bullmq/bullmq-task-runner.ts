import { Logger } from '@nestjs/common';
import type { Job, Queue, Worker } from 'bullmq';
import { randomBytes } from 'node:crypto';
import type { Clock } from '../../../core/clock';
import type { DbTx } from '../../../core/db';
import type { RedisConnections } from '../../redis';
import { type BackoffOptions, retryDelay } from '../backoff';
import { isTransientError, PermanentTaskError } from '../task-errors';
import { type TaskRow, type TaskStore, toStatus } from '../task-store';
import type { FailedTask, RawTaskContext, RawTaskSpec, TaskHandlerFn, TaskKindOptions, TaskRunner, TaskRunnerHealth, TaskStatus } from '../tasks.port';

type BullMq = typeof import('bullmq');
let lib: BullMq | undefined;
/** BullMQ loads when this runner is chosen (TASKS=redis), not with every import of the tasks barrel (issue 22). */
// eslint-disable-next-line @typescript-eslint/no-require-imports -- lazy and synchronous on purpose, see above
const bullmq = (): BullMq => (lib ??= require('bullmq') as BullMq);
import { RelayStore } from './relay-store';

export interface BullMqRunnerOptions {
  /** How often the relay looks for committed rows (another process's enqueue, a long retry falling due) (ms). */
  pollMs: number;
  /** BullMQ's job lock: a killed process's job is taken back as stalled after about this long (ms). */
  leaseMs: number;
  backoff: BackoffOptions;
  longBackoff: BackoffOptions;
  maxAttempts: number;
}

interface Kind {
  handler: TaskHandlerFn;
  options: TaskKindOptions;
  queue: Queue;
  worker: Worker | null;
}

/** What a queue job carries: the outbox row; the payload stays in SQLite. */
interface JobData {
  taskId: number;
}

/**
 * Tasks on Redis (TASKS=redis): the tasks row is still written in the caller's transaction (the
 * outbox), a relay in every process hands committed, due rows to BullMQ (one queue per kind,
 * job id `t<row>-<random>`, claimed in SQLite first so two relays never both add it), and a
 * BullMQ Worker per kind with the kind's concurrency runs the handler. The row keeps the record
 * screens read (state, attempts, progress, last error); BullMQ keeps the retries (custom backoff:
 * the one `retryDelay`), locks and stalled-job recovery. Handlers are the same and idempotent.
 */
export class BullMqTaskRunner implements TaskRunner {
  private readonly logger = new Logger('TaskRunner');
  private readonly kinds = new Map<string, Kind>();
  private readonly relay: RelayStore;
  private state: 'idle' | 'started' | 'stopped' = 'idle';
  private timer: NodeJS.Timeout | null = null;
  private relaying: Promise<void> | null = null;
  private again = false;
  private lastPollAt: Date | null = null;
  private lastPollFailed = false;
  private stopping: Promise<void> | null = null;
  /** Handlers this process is running, by queue job id (what stop() waits for, then releases). */
  private readonly inflight = new Map<string, InFlight>();

  constructor(
    private readonly store: TaskStore,
    private readonly redis: RedisConnections,
    private readonly clock: Clock,
    private readonly opts: BullMqRunnerOptions,
    db: ConstructorParameters<typeof RelayStore>[0],
  ) {
    this.relay = new RelayStore(db);
  }

  register(kind: string, handler: TaskHandlerFn, options: TaskKindOptions): void {
    if (this.kinds.has(kind)) throw new Error(`Task kind ${kind} already has a handler`);
    const queue = new (bullmq().Queue)<JobData>(kind, { connection: this.redis.main, prefix: this.prefix() });
    this.kinds.set(kind, { handler, options, queue, worker: null });
  }

  enqueue(spec: RawTaskSpec, tx?: DbTx): void {
    this.store.insert(spec, this.clock.now(), tx);
    this.wake();
  }

  status(kind: string, key: string): TaskStatus | null {
    const row = this.store.find(kind, key);
    return row ? toStatus(row) : null;
  }

  failed(shopId: number): FailedTask[] {
    return this.store.failedFor(shopId).map((r) => ({ ...toStatus(r), id: r.id, shopId: r.shopId, updatedAt: r.updatedAt.toISOString() }));
  }

  retry(shopId: number, id: number): boolean {
    const queued = this.store.requeue(shopId, id, this.clock.now());
    if (queued) this.wake();
    return queued;
  }

  prune(before: Date): number {
    return this.store.prune(before);
  }

  health(): TaskRunnerHealth {
    const ok = this.state === 'started' && !this.lastPollFailed && this.redis.main.status === 'ready';
    return { ok, driver: 'redis', lastPollAt: this.lastPollAt?.toISOString() ?? null, counts: this.store.counts() };
  }

  /** Polls the outbox (every process's work, any process's workers) until nothing is due, waiting or running. */
  async settled(): Promise<void> {
    while (this.state !== 'stopped' && this.relay.outstanding([...this.kinds.keys()], this.clock.now()) > 0) {
      await new Promise((r) => setTimeout(r, 20));
    }
  }

  start(): void {
    if (this.state !== 'idle') return;
    this.state = 'started';
    for (const [name, kind] of this.kinds) kind.worker = this.worker(name, kind);
    this.wake();
  }

  /**
   * Takes nothing new and waits for the handlers this process is running, up to `graceMs`; what still runs
   * then is released (as the SQLite runner does): its row goes back to queued, due now, the cut attempt not
   * counted, and its queue job lets go of its lock, so another process takes the task at once, not after a lease.
   */
  stop(graceMs = Infinity): Promise<void> {
    this.stopping ??= this.drain(graceMs);
    return this.stopping;
  }

  private async drain(graceMs: number): Promise<void> {
    this.state = 'stopped';
    if (this.timer) clearTimeout(this.timer);
    await this.relaying;
    const workers = [...this.kinds.values()].flatMap((k) => (k.worker ? [k.worker] : []));
    await Promise.allSettled(workers.map((w) => w.pause(true)));
    let timer: NodeJS.Timeout | undefined;
    const graceOver = new Promise<'over'>((ok) => {
      if (Number.isFinite(graceMs)) timer = setTimeout(() => ok('over'), graceMs);
    });
    const finished = await Promise.race([Promise.allSettled([...this.inflight.values()].map((f) => f.done)), graceOver]);
    clearTimeout(timer);
    if (finished === 'over') await this.releaseInFlight(graceMs);
    await Promise.allSettled(workers.map((w) => w.close(finished === 'over')));
    await Promise.allSettled([...this.kinds.values()].map((k) => k.queue.close()));
  }

  private async releaseInFlight(graceMs: number): Promise<void> {
    const now = this.clock.now();
    let released = 0;
    for (const [jobId, f] of this.inflight) {
      this.safely(() => (released += this.store.release(`queue:${jobId}`, now)));
      // The job runs again elsewhere as a no-op (its row is no longer handed to it); the relay hands the row over anew.
      await f.job.moveToWait(f.token).catch((err: Error) => this.logger.warn(`release of job ${jobId}: ${err.message}`));
    }
    this.logger.warn(`Shutdown: ${released} running task(s) did not finish within ${graceMs} ms; released for the next process`);
  }

  private prefix(): string {
    return this.redis.key('bull');
  }

  private worker(name: string, kind: Kind): Worker<JobData> {
    const worker = new (bullmq().Worker)<JobData>(name, (job, token) => this.track(job, token, this.process(kind, job)), {
      connection: this.redis.open(`worker:${name}`),
      prefix: this.prefix(),
      concurrency: kind.options.concurrency,
      lockDuration: this.opts.leaseMs,
      stalledInterval: Math.max(500, Math.round(this.opts.leaseMs / 2)),
      maxStalledCount: 5,
      removeOnComplete: { age: 24 * 3600, count: 10_000 },
      removeOnFail: { age: 7 * 24 * 3600 },
      settings: { backoffStrategy: (_made: number, _type?: string, err?: RetryError) => err?.retryInMs ?? this.opts.backoff.baseMs },
    });
    worker.on('error', (err) => this.logger.warn(`worker ${name}: ${err.message}`));
    return worker;
  }

  private async track(job: Job<JobData>, token: string | undefined, run: Promise<void>): Promise<void> {
    const id = job.id ?? '';
    this.inflight.set(id, { job, token, done: run });
    try {
      await run;
    } finally {
      this.inflight.delete(id);
    }
  }

  /** One attempt: start it on the row (or skip a row that is finished or handed to another job), run, record. */
  private async process(kind: Kind, job: Job<JobData>): Promise<void> {
    const jobId = job.id ?? '';
    const row = this.relay.start(job.data.taskId, jobId, this.clock.now());
    if (!row) return;
    const owner = `queue:${jobId}`;
    const attempts = job.opts.attempts ?? 1;
    const ctx: RawTaskContext = {
      kind: row.kind,
      key: row.key,
      shopId: row.shopId,
      payload: row.payload,
      attempt: row.attempts,
      final: job.attemptsMade + 1 >= attempts,
      progress: (f: number) => this.safely(() => this.store.progress(row.id, owner, f)),
    };
    try {
      await kind.handler(ctx);
    } catch (err) {
      throw this.recordFailure(kind, row, jobId, err, ctx.final);
    }
    this.store.finish(row.id, owner, this.clock.now());
  }

  /** Same rules as the SQLite runner: quick retries on the kind's backoff, then failed (a transient error comes back on the long backoff). */
  private recordFailure(kind: Kind, row: TaskRow, jobId: string, err: unknown, final: boolean): Error {
    const message = err instanceof Error ? err.message : String(err);
    const now = this.clock.now().getTime();
    if (!(err instanceof PermanentTaskError) && !final) {
      const retryInMs = retryDelay(row.attempts, { ...this.opts.backoff, baseMs: kind.options.backoffBaseMs ?? this.opts.backoff.baseMs });
      this.safely(() => this.relay.retrying(row.id, jobId, new Date(now), message, new Date(now + retryInMs)));
      this.logger.warn(`${row.kind}:${row.key} attempt ${row.attempts} failed (${message}); retry in ${retryInMs} ms`);
      return Object.assign(new Error(message), { retryInMs });
    }
    const max = kind.options.maxAttempts ?? this.opts.maxAttempts;
    const later = isTransientError(err) ? new Date(now + retryDelay(Math.max(1, row.attempts - max + 1), this.opts.longBackoff)) : null;
    this.safely(() => this.store.fail(row.id, `queue:${jobId}`, new Date(now), message, null, later));
    this.logger.warn(
      `${row.kind}:${row.key} attempt ${row.attempts} failed (${message})${later ? `; transient, again at ${later.toISOString()}` : '; giving up'}`,
    );
    return new (bullmq().UnrecoverableError)(message);
  }

  private wake(): void {
    if (this.state !== 'started') return;
    if (this.relaying) {
      this.again = true;
      return;
    }
    this.relaying = this.relayOnce().finally(() => {
      this.relaying = null;
      if (this.again) {
        this.again = false;
        this.wake();
      } else this.schedule();
    });
  }

  private schedule(): void {
    if (this.state !== 'started') return;
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => this.wake(), this.opts.pollMs);
    this.timer.unref();
  }

  /** Hands every due row to its queue, and adds again any hand-over older than a lease whose job is missing. */
  private async relayOnce(): Promise<void> {
    const now = this.clock.now();
    const kinds = [...this.kinds.keys()];
    try {
      for (let rows = this.relay.due(kinds, now, 200); rows.length > 0; rows = this.relay.due(kinds, this.clock.now(), 200)) {
        for (const row of rows) await this.handOver(row);
      }
      for (const row of this.relay.handedOverBefore(kinds, new Date(now.getTime() - this.opts.leaseMs), 200)) await this.add(row, row.leaseOwner!.slice(6));
      this.lastPollAt = now;
      this.lastPollFailed = false;
    } catch (err) {
      this.lastPollFailed = true;
      this.logger.error(`Task relay failed: ${(err as Error).message}`);
    }
  }

  private async handOver(row: TaskRow): Promise<void> {
    const jobId = `t${row.id}-${randomBytes(6).toString('hex')}`;
    const longRetry = row.status === 'failed';
    if (!this.relay.handOver(row, jobId, this.clock.now())) return;
    await this.add(row, jobId, longRetry ? 1 : undefined);
  }

  /** Adding a job id that exists does nothing (BullMQ), so a repeated hand-over never runs twice. */
  private async add(row: TaskRow, jobId: string, attempts?: number): Promise<void> {
    const kind = this.kinds.get(row.kind);
    if (!kind) return;
    const max = attempts ?? Math.max(1, (kind.options.maxAttempts ?? this.opts.maxAttempts) - row.attempts);
    await kind.queue.add(row.kind, { taskId: row.id }, { jobId, attempts: max, backoff: { type: 'custom' } });
  }

  private safely(write: () => void): void {
    try {
      write();
    } catch (err) {
      this.logger.error(`Task bookkeeping failed: ${(err as Error).message}`);
    }
  }
}

interface InFlight {
  job: Job<JobData>;
  token: string | undefined;
  done: Promise<void>;
}

type RetryError = Error & { retryInMs?: number };
