import { Inject, Injectable } from '@nestjs/common';
import { and, eq, inArray } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { showcaseItems } from '../db/schema';
import type { DbTx } from '../core/db';

export type ShowcaseMarkRow = typeof showcaseItems.$inferSelect;

/** Favourite marks and edited captions; every query scoped by shop. */
@Injectable()
export class ShowcaseRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  marks(shopId: number): Map<number, ShowcaseMarkRow> {
    const rows = this.db.select().from(showcaseItems).where(eq(showcaseItems.shopId, shopId)).all();
    return new Map(rows.map((r) => [r.pairId, r]));
  }

  mark(shopId: number, pairId: number): ShowcaseMarkRow | undefined {
    return this.db
      .select()
      .from(showcaseItems)
      .where(and(eq(showcaseItems.shopId, shopId), eq(showcaseItems.pairId, pairId)))
      .get();
  }

  upsert(shopId: number, pairId: number, patch: { favourite?: boolean; caption?: string | null }, at: Date): void {
    this.db
      .insert(showcaseItems)
      .values({ shopId, pairId, favourite: patch.favourite ?? false, caption: patch.caption ?? null, updatedAt: at })
      .onConflictDoUpdate({ target: [showcaseItems.shopId, showcaseItems.pairId], set: { ...patch, updatedAt: at } })
      .run();
  }

  /** Forgets favourites and edited captions of these pairs, inside the caller's transaction when given. */
  drop(shopId: number, pairIds: number[], tx?: DbTx): void {
    if (!pairIds.length) return;
    (tx ?? this.db)
      .delete(showcaseItems)
      .where(and(eq(showcaseItems.shopId, shopId), inArray(showcaseItems.pairId, pairIds)))
      .run();
  }
}
