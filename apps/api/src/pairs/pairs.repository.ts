import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq, max } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { shotPairs } from '../db/schema';

export type ShotPairRow = typeof shotPairs.$inferSelect;
export type NewShotPairRow = typeof shotPairs.$inferInsert;
export type ShotPairPatch = Partial<Pick<ShotPairRow, 'caption' | 'position' | 'cropX' | 'cropY' | 'cropW' | 'cropH' | 'updatedAt'>>;

/** Shot pairs; every query scoped by shop (and job where it names one). */
@Injectable()
export class PairsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  list(shopId: number, jobId: number): ShotPairRow[] {
    return this.db
      .select()
      .from(shotPairs)
      .where(and(eq(shotPairs.shopId, shopId), eq(shotPairs.jobId, jobId)))
      .orderBy(asc(shotPairs.position), asc(shotPairs.id))
      .all();
  }

  /** The job a pair belongs to (shop-scoped), for callers that only hold the pair id. */
  jobOf(shopId: number, id: number): number | null {
    return (
      this.db
        .select({ jobId: shotPairs.jobId })
        .from(shotPairs)
        .where(and(eq(shotPairs.shopId, shopId), eq(shotPairs.id, id)))
        .get()?.jobId ?? null
    );
  }

  find(shopId: number, jobId: number, id: number): ShotPairRow | undefined {
    return this.db
      .select()
      .from(shotPairs)
      .where(and(eq(shotPairs.shopId, shopId), eq(shotPairs.jobId, jobId), eq(shotPairs.id, id)))
      .get();
  }

  findByShots(shopId: number, jobId: number, beforeAssetId: number, afterAssetId: number): ShotPairRow | undefined {
    return this.db
      .select()
      .from(shotPairs)
      .where(
        and(eq(shotPairs.shopId, shopId), eq(shotPairs.jobId, jobId), eq(shotPairs.beforeAssetId, beforeAssetId), eq(shotPairs.afterAssetId, afterAssetId)),
      )
      .get();
  }

  nextPosition(shopId: number, jobId: number): number {
    const row = this.db
      .select({ top: max(shotPairs.position) })
      .from(shotPairs)
      .where(and(eq(shotPairs.shopId, shopId), eq(shotPairs.jobId, jobId)))
      .get();
    return (row?.top ?? -1) + 1;
  }

  insert(row: NewShotPairRow): ShotPairRow {
    return this.db.insert(shotPairs).values(row).returning().all()[0];
  }

  update(shopId: number, id: number, patch: ShotPairPatch): ShotPairRow {
    return this.db
      .update(shotPairs)
      .set(patch)
      .where(and(eq(shotPairs.shopId, shopId), eq(shotPairs.id, id)))
      .returning()
      .all()[0];
  }

  delete(shopId: number, id: number): void {
    this.db
      .delete(shotPairs)
      .where(and(eq(shotPairs.shopId, shopId), eq(shotPairs.id, id)))
      .run();
  }
}
