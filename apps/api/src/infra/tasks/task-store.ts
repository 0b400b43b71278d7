import { and, asc, desc, eq, gt, inArray, lt, lte, or, sql } from 'drizzle-orm';
import { tasks } from '../../db/schema';
import type { Db, DbTx } from '../../core/db';
import type { RawTaskSpec, TaskStatus } from './tasks.port';

export type TaskRow = typeof tasks.$inferSelect;

/** A task waiting for its next run: queued, or failed on a transient error with a long retry. */
const waiting = or(eq(tasks.status, 'queued'), and(eq(tasks.status, 'failed'), eq(tasks.retryLater, true)));

/** A task this process may take: waiting and due, or running under a lease that has run out. */
const claimable = (kind: string, now: Date) =>
  and(eq(tasks.kind, kind), or(and(waiting, lte(tasks.nextRunAt, now)), and(eq(tasks.status, 'running'), lt(tasks.leasedUntil, now))));

export const toStatus = (r: TaskRow): TaskStatus => ({
  kind: r.kind,
  key: r.key,
  state: r.status,
  attempts: r.attempts,
  lastError: r.lastError,
  progress: r.progress,
  nextRunAt: r.status === 'queued' || (r.status === 'failed' && r.retryLater) ? r.nextRunAt.toISOString() : null,
});

/** SQL of the durable runner; shop-less on purpose (tasks are global housekeeping of the server). */
export class TaskStore {
  constructor(private readonly db: Db) {}

  /** Inserts in the caller's transaction when given; a failed task with the same key is queued afresh. */
  insert(spec: RawTaskSpec, now: Date, tx?: DbTx): void {
    const fresh = {
      status: 'queued' as const,
      attempts: 0,
      lastError: null,
      progress: 0,
      nextRunAt: spec.runAt ?? now,
      retryLater: false,
      payload: spec.payload ?? {},
      updatedAt: now,
    };
    (tx ?? this.db)
      .insert(tasks)
      .values({ kind: spec.kind, key: spec.key, shopId: spec.shopId, createdAt: now, ...fresh })
      .onConflictDoUpdate({ target: [tasks.kind, tasks.key], set: fresh, where: eq(tasks.status, 'failed') })
      .run();
  }

  find(kind: string, key: string): TaskRow | undefined {
    return this.db
      .select()
      .from(tasks)
      .where(and(eq(tasks.kind, kind), eq(tasks.key, key)))
      .get();
  }

  /** Takes up to `limit` due tasks of one kind under a lease, atomically (one SQLite write transaction). */
  claim(kind: string, limit: number, owner: string, now: Date, leaseMs: number): TaskRow[] {
    if (limit <= 0) return [];
    return this.db.transaction((tx) => {
      const ids = tx
        .select({ id: tasks.id })
        .from(tasks)
        .where(claimable(kind, now))
        .orderBy(asc(tasks.nextRunAt))
        .limit(limit)
        .all()
        .map((r) => r.id);
      if (ids.length === 0) return [];
      return tx
        .update(tasks)
        .set({ status: 'running', attempts: sql`${tasks.attempts} + 1`, leaseOwner: owner, leasedUntil: new Date(now.getTime() + leaseMs), updatedAt: now })
        .where(inArray(tasks.id, ids))
        .returning()
        .all();
    });
  }

  /**
   * Shutdown: this owner's running tasks go back to the queue, due now, without the attempt the shutdown cut short.
   * Their handlers, if they still finish, find the row no longer theirs (`mine`) and change nothing.
   */
  release(owner: string, now: Date): number {
    return this.db
      .update(tasks)
      .set({ status: 'queued', leaseOwner: null, leasedUntil: null, nextRunAt: now, attempts: sql`max(${tasks.attempts} - 1, 0)`, updatedAt: now })
      .where(and(eq(tasks.status, 'running'), eq(tasks.leaseOwner, owner)))
      .run().changes;
  }

  /** Only the holder of the lease may touch a running task (a slow process that lost it must not). */
  private mine(id: number, owner: string) {
    return and(eq(tasks.id, id), eq(tasks.status, 'running'), eq(tasks.leaseOwner, owner));
  }

  renew(id: number, owner: string, until: Date): void {
    this.db.update(tasks).set({ leasedUntil: until }).where(this.mine(id, owner)).run();
  }

  progress(id: number, owner: string, fraction: number): void {
    this.db
      .update(tasks)
      .set({ progress: Math.min(1, Math.max(0, fraction)) })
      .where(this.mine(id, owner))
      .run();
  }

  finish(id: number, owner: string, now: Date): void {
    this.db
      .update(tasks)
      .set({ status: 'done', progress: 1, lastError: null, leaseOwner: null, leasedUntil: null, updatedAt: now })
      .where(this.mine(id, owner))
      .run();
  }

  /** Back to the queue at `retryAt`; or failed, taken again at `later` when the error was transient, else for good. */
  fail(id: number, owner: string, now: Date, error: string, retryAt: Date | null, later: Date | null = null): void {
    const next = retryAt
      ? { status: 'queued' as const, nextRunAt: retryAt, retryLater: false }
      : { status: 'failed' as const, retryLater: later !== null, ...(later ? { nextRunAt: later } : {}) };
    this.db
      .update(tasks)
      .set({ ...next, lastError: error.slice(0, 1000), leaseOwner: null, leasedUntil: null, updatedAt: now })
      .where(this.mine(id, owner))
      .run();
  }

  /**
   * Work waiting for these kinds: due, waiting for a retry, or running under a lease that ran
   * out. A task scheduled for later that has not been tried yet (periodic housekeeping) is not.
   */
  pendingCount(kinds: string[], now: Date): number {
    if (kinds.length === 0) return 0;
    const pending = and(eq(tasks.status, 'queued'), or(lte(tasks.nextRunAt, now), gt(tasks.attempts, 0)));
    const row = this.db
      .select({ n: sql<number>`count(*)` })
      .from(tasks)
      .where(and(inArray(tasks.kind, kinds), or(pending, and(eq(tasks.status, 'running'), lt(tasks.leasedUntil, now)))))
      .get();
    return row?.n ?? 0;
  }

  /** Failed tasks of one shop, newest first. */
  failedFor(shopId: number, limit = 200): TaskRow[] {
    return this.db
      .select()
      .from(tasks)
      .where(and(eq(tasks.shopId, shopId), eq(tasks.status, 'failed')))
      .orderBy(desc(tasks.updatedAt))
      .limit(limit)
      .all();
  }

  /** A manager's retry: the failed task of that shop is queued now with fresh attempts. */
  requeue(shopId: number, id: number, now: Date): boolean {
    return (
      this.db
        .update(tasks)
        .set({ status: 'queued', attempts: 0, retryLater: false, nextRunAt: now, progress: 0, updatedAt: now })
        .where(and(eq(tasks.id, id), eq(tasks.shopId, shopId), eq(tasks.status, 'failed')))
        .run().changes > 0
    );
  }

  /** When the next queued task of these kinds falls due (for the wake-up timer). */
  nextDue(kinds: string[]): Date | null {
    if (kinds.length === 0) return null;
    const row = this.db
      .select({ at: sql<number | null>`min(${tasks.nextRunAt})` })
      .from(tasks)
      .where(and(inArray(tasks.kind, kinds), waiting))
      .get();
    const at = row?.at;
    return at === null || at === undefined ? null : new Date(at);
  }

  counts(): Record<TaskRow['status'], number> {
    const out = { queued: 0, running: 0, done: 0, failed: 0 };
    for (const r of this.db
      .select({ status: tasks.status, n: sql<number>`count(*)` })
      .from(tasks)
      .groupBy(tasks.status)
      .all())
      out[r.status] = r.n;
    return out;
  }

  prune(before: Date): number {
    return this.db
      .delete(tasks)
      .where(and(eq(tasks.status, 'done'), lt(tasks.updatedAt, before)))
      .run().changes;
  }

  /** A cheap read that proves the table answers (readiness). */
  ping(): void {
    this.db.select({ id: tasks.id }).from(tasks).limit(1).all();
  }
}
