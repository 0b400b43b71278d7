import { and, eq, inArray, isNull, lte, or, sql } from 'drizzle-orm';
import { tasks } from '../../../db/schema';
import type { Db } from '../../../core/db';
import type { TaskRow } from '../task-store';

/**
 * The SQL the BullMQ driver adds to TaskStore. The tasks row stays the outbox and the record
 * screens read; `lease_owner = 'queue:<job id>'` says which queue job the row was handed to
 * (one hand-over per generation: a row that fails for good or is retried by a manager is
 * handed over again under a new job id).
 */
export class RelayStore {
  constructor(private readonly db: Db) {}

  /** Committed rows that are due and not yet handed to the queue (queued, or failed with a long retry that fell due). */
  due(kinds: string[], now: Date, limit: number): TaskRow[] {
    if (kinds.length === 0) return [];
    const waiting = or(eq(tasks.status, 'queued'), and(eq(tasks.status, 'failed'), eq(tasks.retryLater, true)));
    return this.db
      .select()
      .from(tasks)
      .where(and(inArray(tasks.kind, kinds), isNull(tasks.leaseOwner), waiting, lte(tasks.nextRunAt, now)))
      .orderBy(tasks.nextRunAt)
      .limit(limit)
      .all();
  }

  /** Claims the row for one queue job; false when another process's relay was first. */
  handOver(row: TaskRow, jobId: string, now: Date): boolean {
    return (
      this.db
        .update(tasks)
        .set({ status: 'queued', retryLater: false, leaseOwner: owner(jobId), leasedUntil: null, updatedAt: now })
        .where(and(eq(tasks.id, row.id), isNull(tasks.leaseOwner), eq(tasks.status, row.status)))
        .run().changes > 0
    );
  }

  /** Rows handed over whose queue job may never have been added (the process died between the two steps). */
  handedOverBefore(kinds: string[], before: Date, limit: number): TaskRow[] {
    if (kinds.length === 0) return [];
    return this.db
      .select()
      .from(tasks)
      .where(and(inArray(tasks.kind, kinds), eq(tasks.status, 'queued'), sql`${tasks.leaseOwner} like 'queue:%'`, lte(tasks.updatedAt, before)))
      .limit(limit)
      .all();
  }

  /** The queue job starts an attempt: only the job the row was handed to, and only while the row is not finished. */
  start(id: number, jobId: string, now: Date): TaskRow | undefined {
    return this.db
      .update(tasks)
      .set({ status: 'running', attempts: sql`${tasks.attempts} + 1`, updatedAt: now })
      .where(and(eq(tasks.id, id), eq(tasks.leaseOwner, owner(jobId)), inArray(tasks.status, ['queued', 'running'])))
      .returning()
      .all()[0];
  }

  /** A failed attempt that the queue will retry at `retryAt`: the row stays with its job. */
  retrying(id: number, jobId: string, now: Date, error: string, retryAt: Date): void {
    this.db
      .update(tasks)
      .set({ status: 'queued', lastError: error.slice(0, 1000), nextRunAt: retryAt, updatedAt: now })
      .where(and(eq(tasks.id, id), eq(tasks.leaseOwner, owner(jobId)), eq(tasks.status, 'running')))
      .run();
  }

  /** Work not finished for these kinds: running, due, or waiting for a retry (what `settled` waits for). */
  outstanding(kinds: string[], now: Date): number {
    if (kinds.length === 0) return 0;
    const pending = and(eq(tasks.status, 'queued'), or(lte(tasks.nextRunAt, now), sql`${tasks.attempts} > 0`, sql`${tasks.leaseOwner} is not null`));
    const row = this.db
      .select({ n: sql<number>`count(*)` })
      .from(tasks)
      .where(and(inArray(tasks.kind, kinds), or(eq(tasks.status, 'running'), pending)))
      .get();
    return row?.n ?? 0;
  }
}

export const owner = (jobId: string): string => `queue:${jobId}`;
