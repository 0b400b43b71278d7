import { Inject, Injectable } from '@nestjs/common';
import type { CustomerListQuery } from '@benchproof/contracts';
import { and, asc, count, desc, eq, inArray, like, or, type SQL } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { customers } from '../db/schema';

export type CustomerRow = typeof customers.$inferSelect;
export type NewCustomerRow = typeof customers.$inferInsert;

const SORT_COLUMN = { name: customers.name, createdAt: customers.createdAt } as const;

/** Every query is scoped by shop: an id from another shop reads as missing. */
@Injectable()
export class CustomersRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  private matches(q: string): SQL | undefined {
    const pattern = `%${q}%`;
    return or(like(customers.name, pattern), like(customers.email, pattern), like(customers.phone, pattern));
  }

  page(shopId: number, query: CustomerListQuery): { rows: CustomerRow[]; total: number } {
    const where = and(eq(customers.shopId, shopId), query.q ? this.matches(query.q) : undefined);
    const total = this.db.select({ n: count() }).from(customers).where(where).get()?.n ?? 0;
    const rows = this.db
      .select()
      .from(customers)
      .where(where)
      .orderBy((query.order === 'desc' ? desc : asc)(SORT_COLUMN[query.sort]), asc(customers.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize)
      .all();
    return { rows, total };
  }

  matchingIds(shopId: number, q: string): number[] {
    return this.db
      .select({ id: customers.id })
      .from(customers)
      .where(and(eq(customers.shopId, shopId), this.matches(q)))
      .all()
      .map((r) => r.id);
  }

  find(shopId: number, id: number): CustomerRow | undefined {
    return this.db.select().from(customers).where(and(eq(customers.shopId, shopId), eq(customers.id, id))).get();
  }

  findMany(shopId: number, ids: number[]): CustomerRow[] {
    if (ids.length === 0) return [];
    return this.db.select().from(customers).where(and(eq(customers.shopId, shopId), inArray(customers.id, ids))).all();
  }

  insert(row: NewCustomerRow): CustomerRow {
    return this.db.insert(customers).values(row).returning().get();
  }

  update(shopId: number, id: number, patch: Partial<NewCustomerRow>): CustomerRow | undefined {
    return this.db.update(customers).set(patch).where(and(eq(customers.shopId, shopId), eq(customers.id, id))).returning().get();
  }
}
