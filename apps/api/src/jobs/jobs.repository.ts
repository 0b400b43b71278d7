import { Inject, Injectable } from '@nestjs/common';
import type { JobListQuery } from '@benchproof/contracts';
import { TERMINAL_STATUSES, type JobStatus } from '@benchproof/domain';
import { and, asc, count, desc, eq, gte, inArray, isNull, like, lt, lte, notInArray, or, type SQL } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { finalChecks, jobStatusEvents, jobs } from '../db/schema';
import type { DbTx } from '../infra/tasks';

export type JobRow = typeof jobs.$inferSelect;
export type NewJobRow = typeof jobs.$inferInsert;
export type JobEventRow = typeof jobStatusEvents.$inferSelect;
export type FinalCheckRow = typeof finalChecks.$inferSelect;

/** Statuses in which a passed promised day no longer counts as overdue. */
export const DONE_STATUSES: JobStatus[] = ['ready', 'collected', 'cancelled'];

const SORT_COLUMN = { promisedOn: jobs.promisedOn, createdAt: jobs.createdAt, number: jobs.number, status: jobs.status } as const;

export interface JobSearch {
  query: JobListQuery;
  today: string;
  /** Owners and bikes whose names/specs matched the free text (resolved by their features). */
  customerIds: number[];
  bikeIds: number[];
}

/** Jobs, their status history and final checks; every query scoped by shop. */
@Injectable()
export class JobsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  /** `tx` is for domain events and task enqueues that must commit with the change. */
  transaction<T>(fn: (tx: DbTx) => T): T {
    return this.db.transaction((tx) => fn(tx));
  }

  private filters(shopId: number, s: JobSearch): SQL | undefined {
    const { query: f, today } = s;
    const text = f.q
      ? or(like(jobs.number, `%${f.q}%`), s.customerIds.length ? inArray(jobs.customerId, s.customerIds) : undefined, s.bikeIds.length ? inArray(jobs.bikeId, s.bikeIds) : undefined)
      : undefined;
    const overdue = and(lt(jobs.promisedOn, today), notInArray(jobs.status, DONE_STATUSES));
    const notOverdue = or(gte(jobs.promisedOn, today), inArray(jobs.status, DONE_STATUSES), isNull(jobs.promisedOn));
    return and(
      eq(jobs.shopId, shopId),
      f.status?.length ? inArray(jobs.status, f.status) : undefined,
      f.mechanicId ? eq(jobs.mechanicId, f.mechanicId) : undefined,
      f.promisedAfter ? gte(jobs.promisedOn, f.promisedAfter) : undefined,
      f.promisedBefore ? lte(jobs.promisedOn, f.promisedBefore) : undefined,
      f.overdue === undefined ? undefined : f.overdue ? overdue : notOverdue,
      f.open === undefined ? undefined : f.open ? notInArray(jobs.status, [...TERMINAL_STATUSES]) : inArray(jobs.status, [...TERMINAL_STATUSES]),
      text,
    );
  }

  page(shopId: number, s: JobSearch): { rows: JobRow[]; total: number } {
    const where = this.filters(shopId, s);
    const total = this.db.select({ n: count() }).from(jobs).where(where).get()?.n ?? 0;
    const rows = this.db
      .select()
      .from(jobs)
      .where(where)
      .orderBy((s.query.order === 'desc' ? desc : asc)(SORT_COLUMN[s.query.sort]), desc(jobs.id))
      .limit(s.query.pageSize)
      .offset((s.query.page - 1) * s.query.pageSize)
      .all();
    return { rows, total };
  }

  listByBike(shopId: number, bikeId: number): JobRow[] {
    return this.db.select().from(jobs).where(and(eq(jobs.shopId, shopId), eq(jobs.bikeId, bikeId))).orderBy(asc(jobs.bookedInAt), asc(jobs.id)).all();
  }

  find(shopId: number, id: number): JobRow | undefined {
    return this.db.select().from(jobs).where(and(eq(jobs.shopId, shopId), eq(jobs.id, id))).get();
  }

  insert(row: NewJobRow): JobRow {
    return this.db.insert(jobs).values(row).returning().get();
  }

  update(shopId: number, id: number, patch: Partial<NewJobRow>): JobRow {
    return this.db.update(jobs).set(patch).where(and(eq(jobs.shopId, shopId), eq(jobs.id, id))).returning().get();
  }

  insertEvent(row: typeof jobStatusEvents.$inferInsert): void {
    this.db.insert(jobStatusEvents).values(row).run();
  }

  events(shopId: number, jobId: number): JobEventRow[] {
    return this.db
      .select()
      .from(jobStatusEvents)
      .where(and(eq(jobStatusEvents.shopId, shopId), eq(jobStatusEvents.jobId, jobId)))
      .orderBy(asc(jobStatusEvents.at), asc(jobStatusEvents.id))
      .all();
  }

  insertFinalCheck(row: typeof finalChecks.$inferInsert): FinalCheckRow {
    return this.db.insert(finalChecks).values(row).returning().get();
  }

  latestFinalCheck(shopId: number, jobId: number): FinalCheckRow | undefined {
    return this.db
      .select()
      .from(finalChecks)
      .where(and(eq(finalChecks.shopId, shopId), eq(finalChecks.jobId, jobId)))
      .orderBy(desc(finalChecks.at), desc(finalChecks.id))
      .limit(1)
      .get();
  }
}
