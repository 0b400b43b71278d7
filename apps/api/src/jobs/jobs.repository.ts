import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { finalChecks, jobStatusEvents, jobs } from '../db/schema';
import { JobsListQuery, type JobListRow, type JobSearch } from './jobs-list.query';

export type JobRow = typeof jobs.$inferSelect;
export type NewJobRow = typeof jobs.$inferInsert;
export type JobEventRow = typeof jobStatusEvents.$inferSelect;
export type FinalCheckRow = typeof finalChecks.$inferSelect;

export { DONE_STATUSES, type JobListRow, type JobSearch } from './jobs-list.query';

/** Jobs, their status history and final checks; every query scoped by shop. */
@Injectable()
export class JobsRepository {
  private readonly list: JobsListQuery;

  constructor(@Inject(DB) private readonly db: Db) {
    this.list = new JobsListQuery(db);
  }

  /** One page of the jobs list with owner, bike and mechanic joined in, and the matching total. */
  page(shopId: number, s: JobSearch): { rows: JobListRow[]; total: number } {
    return this.list.page(shopId, s);
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
    return this.db.insert(jobs).values(row).returning().all()[0];
  }

  update(shopId: number, id: number, patch: Partial<NewJobRow>): JobRow {
    return this.db
      .update(jobs)
      .set(patch)
      .where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)))
      .returning()
      .all()[0];
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
    return this.db.insert(finalChecks).values(row).returning().all()[0];
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
