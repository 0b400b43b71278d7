import { Inject, Injectable } from '@nestjs/common';
import { and, eq, isNotNull } from 'drizzle-orm';
import { DB, type Db, type DbTx } from '../core/db';
import { showcaseExports } from '../db/schema';

export type ShowcaseExportRow = typeof showcaseExports.$inferSelect;
type NewExport = typeof showcaseExports.$inferInsert;

/** Background showcase exports; every query scoped by shop (the task's own writes by key). */
@Injectable()
export class ShowcaseExportsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  insert(row: NewExport, tx: DbTx): void {
    tx.insert(showcaseExports).values(row).run();
  }

  find(shopId: number, key: string): ShowcaseExportRow | undefined {
    return this.db
      .select()
      .from(showcaseExports)
      .where(and(eq(showcaseExports.shopId, shopId), eq(showcaseExports.key, key)))
      .get();
  }

  update(shopId: number, key: string, patch: Partial<NewExport>): void {
    this.db
      .update(showcaseExports)
      .set(patch)
      .where(and(eq(showcaseExports.shopId, shopId), eq(showcaseExports.key, key)))
      .run();
  }

  /** Finished exports whose zip is still stored (to purge those that hold a revoked job). */
  stored(shopId: number): ShowcaseExportRow[] {
    return this.db
      .select()
      .from(showcaseExports)
      .where(and(eq(showcaseExports.shopId, shopId), eq(showcaseExports.status, 'done'), isNotNull(showcaseExports.zipKey)))
      .all();
  }
}
