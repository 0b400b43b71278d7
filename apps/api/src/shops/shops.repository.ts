import { Inject, Injectable } from '@nestjs/common';
import { eq, sql } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { shops } from '../db/schema';

export type ShopRow = typeof shops.$inferSelect;

@Injectable()
export class ShopsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  /** Read on many requests (the jobs list's balances, the job page): prepared once, on first use. */
  find(id: number): ShopRow | undefined {
    this.byId ??= this.prepareById();
    return this.byId.get({ id });
  }

  private byId: ReturnType<ShopsRepository['prepareById']> | undefined;

  private prepareById() {
    return this.db
      .select()
      .from(shops)
      .where(eq(shops.id, sql.placeholder('id')))
      .prepare();
  }

  insert(row: typeof shops.$inferInsert): ShopRow {
    return this.db.insert(shops).values(row).returning().all()[0];
  }

  any(): boolean {
    return Boolean(this.db.select({ id: shops.id }).from(shops).limit(1).get());
  }

  update(id: number, patch: Partial<ShopRow>): ShopRow {
    return this.db.update(shops).set(patch).where(eq(shops.id, id)).returning().all()[0];
  }

  /** Takes the shop's next job sequence number atomically. */
  takeJobSeq(id: number): number {
    const row = this.db
      .update(shops)
      .set({ nextJobSeq: sql`${shops.nextJobSeq} + 1` })
      .where(eq(shops.id, id))
      .returning({ seq: shops.nextJobSeq })
      .all()[0];
    return row.seq - 1;
  }
}
