import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { torqueEntries, workEntries } from '../db/schema';

export type WorkEntryRow = typeof workEntries.$inferSelect;
export type TorqueEntryRow = typeof torqueEntries.$inferSelect;

/** Work and torque entries; every query scoped by shop and job. */
@Injectable()
export class WorkLogRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  workEntries(shopId: number, jobId: number): WorkEntryRow[] {
    return this.db
      .select()
      .from(workEntries)
      .where(and(eq(workEntries.shopId, shopId), eq(workEntries.jobId, jobId)))
      .orderBy(asc(workEntries.at), asc(workEntries.id))
      .all();
  }

  workEntry(shopId: number, jobId: number, id: number): WorkEntryRow | undefined {
    return this.db
      .select()
      .from(workEntries)
      .where(and(eq(workEntries.shopId, shopId), eq(workEntries.jobId, jobId), eq(workEntries.id, id)))
      .get();
  }

  insertWorkEntry(row: typeof workEntries.$inferInsert): WorkEntryRow {
    return this.db.insert(workEntries).values(row).returning().all()[0];
  }

  deleteWorkEntry(shopId: number, id: number): void {
    this.db
      .delete(workEntries)
      .where(and(eq(workEntries.shopId, shopId), eq(workEntries.id, id)))
      .run();
  }

  torqueEntries(shopId: number, jobId: number): TorqueEntryRow[] {
    return this.db
      .select()
      .from(torqueEntries)
      .where(and(eq(torqueEntries.shopId, shopId), eq(torqueEntries.jobId, jobId)))
      .orderBy(asc(torqueEntries.at), asc(torqueEntries.id))
      .all();
  }

  insertTorqueEntry(row: typeof torqueEntries.$inferInsert): TorqueEntryRow {
    return this.db.insert(torqueEntries).values(row).returning().all()[0];
  }
}
