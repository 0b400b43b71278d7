import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { annotationVersions, measurementEvidence } from '../db/schema';

export type AnnotationVersionRow = typeof annotationVersions.$inferSelect;

/** Annotation versions and measurement evidence; every query scoped by shop. */
@Injectable()
export class AnnotationsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  latest(shopId: number, assetId: number): AnnotationVersionRow | undefined {
    return this.db
      .select()
      .from(annotationVersions)
      .where(and(eq(annotationVersions.shopId, shopId), eq(annotationVersions.assetId, assetId)))
      .orderBy(desc(annotationVersions.version))
      .limit(1)
      .get();
  }

  insert(row: typeof annotationVersions.$inferInsert): AnnotationVersionRow {
    return this.db.insert(annotationVersions).values(row).returning().all()[0];
  }

  addEvidence(row: typeof measurementEvidence.$inferInsert): void {
    this.db.insert(measurementEvidence).values(row).onConflictDoNothing().run();
  }
}
