import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, isNotNull, like, max, or } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { reports, users } from '../db/schema';

export type ReportRow = typeof reports.$inferSelect;
export type NewReportRow = typeof reports.$inferInsert;
export type ReportPatch = Partial<Pick<ReportRow, 'state' | 'error' | 'storageKey' | 'sha256' | 'byteSize' | 'pageCount' | 'renderedAt'>>;

@Injectable()
export class ReportsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  insert(row: NewReportRow): ReportRow {
    return this.db.insert(reports).values(row).returning().all()[0];
  }

  update(id: number, patch: ReportPatch): ReportRow {
    return this.db.update(reports).set(patch).where(eq(reports.id, id)).returning().all()[0];
  }

  /** Render tasks carry only the id; the task runner already scoped the work when it was queued. */
  findById(id: number): ReportRow | undefined {
    return this.db.select().from(reports).where(eq(reports.id, id)).get();
  }

  findInShop(shopId: number, jobId: number, id: number): ReportRow | undefined {
    return this.db
      .select()
      .from(reports)
      .where(and(eq(reports.shopId, shopId), eq(reports.jobId, jobId), eq(reports.id, id)))
      .get();
  }

  listForJob(shopId: number, jobId: number): (ReportRow & { createdByName: string | null })[] {
    return this.db
      .select({ r: reports, createdByName: users.name })
      .from(reports)
      .leftJoin(users, eq(users.id, reports.createdBy))
      .where(and(eq(reports.shopId, shopId), eq(reports.jobId, jobId)))
      .orderBy(desc(reports.createdAt), desc(reports.id))
      .all()
      .map(({ r, createdByName }) => ({ ...r, createdByName }));
  }

  /** Rows whose render had not finished when the server stopped (every shop: boot-time recovery). */
  listRendering(): ReportRow[] {
    return this.db.select().from(reports).where(eq(reports.state, 'rendering')).all();
  }

  nextVersion(shopId: number, jobId: number): number {
    const row = this.db
      .select({ v: max(reports.version) })
      .from(reports)
      .where(and(eq(reports.shopId, shopId), eq(reports.jobId, jobId)))
      .get();
    return (row?.v ?? 0) + 1;
  }

  /**
   * The public verify lookup, across shops by design: anyone holding a PDF may ask.
   * Matches an issued, rendered version by its file SHA-256, its content fingerprint,
   * or the 16-hex short code (the fingerprint's prefix) printed in the verify link.
   */
  findIssuedByHash(hash: string): ReportRow | undefined {
    const match = hash.length === 16 ? like(reports.fingerprint, `${hash}%`) : or(eq(reports.sha256, hash), eq(reports.fingerprint, hash));
    return this.db
      .select()
      .from(reports)
      .where(and(eq(reports.kind, 'issued'), eq(reports.state, 'ready'), isNotNull(reports.sha256), match))
      .get();
  }
}
