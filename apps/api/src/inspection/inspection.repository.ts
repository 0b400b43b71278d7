import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { checkpoints, measurements } from '../db/schema';

export type CheckpointRow = typeof checkpoints.$inferSelect;
export type NewCheckpointRow = typeof checkpoints.$inferInsert;
export type MeasurementRow = typeof measurements.$inferSelect;
export type NewMeasurementRow = typeof measurements.$inferInsert;

/** Checkpoints and measurements; every query scoped by shop and job. */
@Injectable()
export class InspectionRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  insertCheckpoints(rows: NewCheckpointRow[]): void {
    if (rows.length) this.db.insert(checkpoints).values(rows).run();
  }

  checkpoints(shopId: number, jobId: number): CheckpointRow[] {
    return this.db
      .select()
      .from(checkpoints)
      .where(and(eq(checkpoints.shopId, shopId), eq(checkpoints.jobId, jobId)))
      .orderBy(asc(checkpoints.position))
      .all();
  }

  checkpoint(shopId: number, jobId: number, id: number): CheckpointRow | undefined {
    return this.db
      .select()
      .from(checkpoints)
      .where(and(eq(checkpoints.shopId, shopId), eq(checkpoints.jobId, jobId), eq(checkpoints.id, id)))
      .get();
  }

  updateCheckpoint(shopId: number, id: number, patch: Partial<NewCheckpointRow>): CheckpointRow {
    return this.db
      .update(checkpoints)
      .set(patch)
      .where(and(eq(checkpoints.shopId, shopId), eq(checkpoints.id, id)))
      .returning()
      .all()[0];
  }

  measurements(shopId: number, jobIds: number[]): MeasurementRow[] {
    if (jobIds.length === 0) return [];
    return this.db
      .select()
      .from(measurements)
      .where(and(eq(measurements.shopId, shopId), inArray(measurements.jobId, jobIds)))
      .orderBy(asc(measurements.at), asc(measurements.id))
      .all();
  }

  measurement(shopId: number, jobId: number, id: number): MeasurementRow | undefined {
    return this.db
      .select()
      .from(measurements)
      .where(and(eq(measurements.shopId, shopId), eq(measurements.jobId, jobId), eq(measurements.id, id)))
      .get();
  }

  insertMeasurement(row: NewMeasurementRow): MeasurementRow {
    return this.db.insert(measurements).values(row).returning().all()[0];
  }

  deleteMeasurement(shopId: number, id: number): void {
    this.db
      .delete(measurements)
      .where(and(eq(measurements.shopId, shopId), eq(measurements.id, id)))
      .run();
  }
}
