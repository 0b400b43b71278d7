import { Inject, Injectable } from '@nestjs/common';
import type { JobListQuery } from '@benchproof/contracts';
import { JOB_STATUSES, TERMINAL_STATUSES, type JobStatus } from '@benchproof/domain';
import { and, asc, count, desc, eq, getTableColumns, gte, inArray, isNull, lt, lte, or, sql, type SQL } from 'drizzle-orm';
import { DB, ftsPrefixQuery, type Db } from '../core/db';
import { bikes, customers, finalChecks, jobStatusEvents, jobs } from '../db/schema';
import type { DbTx } from '../infra/tasks';

export type JobRow = typeof jobs.$inferSelect;
export type NewJobRow = typeof jobs.$inferInsert;
export type JobEventRow = typeof jobStatusEvents.$inferSelect;
export type FinalCheckRow = typeof finalChecks.$inferSelect;

/** Statuses in which a passed promised day no longer counts as overdue. */
export const DONE_STATUSES: JobStatus[] = ['ready', 'collected', 'cancelled'];
const NOT_DONE = JOB_STATUSES.filter((st) => !DONE_STATUSES.includes(st));
const OPEN = JOB_STATUSES.filter((st) => !TERMINAL_STATUSES.includes(st));

/** A jobs-list row: the job with the owner's name and the bike's identity joined in (a read model). */
export type JobListRow = JobRow & { ownerName: string; bikeMaker: string; bikeModel: string; bikeColour: string; bikeSerial: string };

const LIST_COLUMNS = {
  ...getTableColumns(jobs),
  ownerName: customers.name,
  bikeMaker: bikes.maker,
  bikeModel: bikes.model,
  bikeColour: bikes.colour,
  bikeSerial: bikes.serialNumber,
};

const SORT_COLUMN = { promisedOn: jobs.promisedOn, createdAt: jobs.createdAt, number: jobs.number, status: jobs.status } as const;

export interface JobSearch {
  query: JobListQuery;
  today: string;
}

/** Jobs, their status history and final checks; every query scoped by shop. */
@Injectable()
export class JobsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  /** `tx` is for domain events and task enqueues that must commit with the change. */
  transaction<T>(fn: (tx: DbTx) => T): T {
    return this.db.transaction((tx) => fn(tx));
  }

  /**
   * Status filters are written as IN lists (never NOT IN) so the (shop, status, promised)
   * index serves them; free text goes through the job_search FTS5 index.
   */
  private filters(shopId: number, s: JobSearch, text: string | null): SQL | undefined {
    const { query: f, today } = s;
    const overdue = and(lt(jobs.promisedOn, today), inArray(jobs.status, NOT_DONE));
    const notOverdue = or(gte(jobs.promisedOn, today), inArray(jobs.status, DONE_STATUSES), isNull(jobs.promisedOn));
    return and(
      eq(jobs.shopId, shopId),
      f.status?.length ? inArray(jobs.status, f.status) : undefined,
      f.mechanicId ? eq(jobs.mechanicId, f.mechanicId) : undefined,
      f.promisedAfter ? gte(jobs.promisedOn, f.promisedAfter) : undefined,
      f.promisedBefore ? lte(jobs.promisedOn, f.promisedBefore) : undefined,
      f.overdue === undefined ? undefined : f.overdue ? overdue : notOverdue,
      f.open === undefined ? undefined : inArray(jobs.status, f.open ? OPEN : [...TERMINAL_STATUSES]),
      text === null ? undefined : sql`${jobs.id} IN (SELECT rowid FROM job_search WHERE job_search MATCH ${text})`,
    );
  }

  /** One page of the jobs list with owner and bike joined in, and the matching total. */
  page(shopId: number, s: JobSearch): { rows: JobListRow[]; total: number } {
    const text = s.query.q ? ftsPrefixQuery(s.query.q) : null;
    if (s.query.q && text === null) return { rows: [], total: 0 };
    const where = this.filters(shopId, s, text);
    const total = this.db.select({ n: count() }).from(jobs).where(where).get()?.n ?? 0;
    const rows = this.db
      .select(LIST_COLUMNS)
      .from(jobs)
      .innerJoin(customers, eq(customers.id, jobs.customerId))
      .innerJoin(bikes, eq(bikes.id, jobs.bikeId))
      .where(where)
      .orderBy((s.query.order === 'desc' ? desc : asc)(SORT_COLUMN[s.query.sort]), desc(jobs.id))
      .limit(s.query.pageSize)
      .offset((s.query.page - 1) * s.query.pageSize)
      .all();
    return { rows, total };
  }

  listByBike(shopId: number, bikeId: number): JobRow[] {
    return this.db
      .select()
      .from(jobs)
      .where(and(eq(jobs.shopId, shopId), eq(jobs.bikeId, bikeId)))
      .orderBy(asc(jobs.bookedInAt), asc(jobs.id))
      .all();
  }

  find(shopId: number, id: number): JobRow | undefined {
    return this.db
      .select()
      .from(jobs)
      .where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)))
      .get();
  }

  insert(row: NewJobRow): JobRow {
    return this.db.insert(jobs).values(row).returning().get();
  }

  update(shopId: number, id: number, patch: Partial<NewJobRow>): JobRow {
    return this.db
      .update(jobs)
      .set(patch)
      .where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)))
      .returning()
      .get();
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
