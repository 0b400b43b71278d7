import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, isNull } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { ownerLinks } from '../db/schema';

export type OwnerLinkRow = typeof ownerLinks.$inferSelect;
export type NewOwnerLinkRow = typeof ownerLinks.$inferInsert;

/** Owner links; every query scoped by shop except the lookup by token hash, which is how a visitor arrives. */
@Injectable()
export class OwnerLinksRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  insert(row: NewOwnerLinkRow): OwnerLinkRow {
    return this.db.insert(ownerLinks).values(row).returning().all()[0];
  }

  byTokenHash(hash: string): OwnerLinkRow | undefined {
    return this.db.select().from(ownerLinks).where(eq(ownerLinks.tokenHash, hash)).get();
  }

  listForJob(shopId: number, jobId: number): OwnerLinkRow[] {
    return this.db
      .select()
      .from(ownerLinks)
      .where(and(eq(ownerLinks.shopId, shopId), eq(ownerLinks.jobId, jobId)))
      .orderBy(desc(ownerLinks.createdAt), desc(ownerLinks.id))
      .all();
  }

  find(shopId: number, jobId: number, id: number): OwnerLinkRow | undefined {
    return this.db
      .select()
      .from(ownerLinks)
      .where(and(eq(ownerLinks.shopId, shopId), eq(ownerLinks.jobId, jobId), eq(ownerLinks.id, id)))
      .get();
  }

  revokeOpen(shopId: number, jobId: number, at: Date, by: number): void {
    this.db
      .update(ownerLinks)
      .set({ revokedAt: at, revokedBy: by })
      .where(and(eq(ownerLinks.shopId, shopId), eq(ownerLinks.jobId, jobId), isNull(ownerLinks.revokedAt)))
      .run();
  }

  update(shopId: number, id: number, patch: Partial<NewOwnerLinkRow>): OwnerLinkRow {
    return this.db
      .update(ownerLinks)
      .set(patch)
      .where(and(eq(ownerLinks.shopId, shopId), eq(ownerLinks.id, id)))
      .returning()
      .all()[0];
  }
}
