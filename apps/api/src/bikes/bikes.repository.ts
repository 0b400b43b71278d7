import { Inject, Injectable } from '@nestjs/common';
import type { BikeListQuery } from '@benchproof/contracts';
import { and, asc, count, desc, eq, inArray, like, or, sql, type SQL } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { bikes } from '../db/schema';

export type BikeRow = typeof bikes.$inferSelect;
export type NewBikeRow = typeof bikes.$inferInsert;

function order(query: BikeListQuery): SQL[] {
  const dir = query.order === 'desc' ? desc : asc;
  return query.sort === 'maker' ? [dir(bikes.maker), dir(bikes.model)] : [dir(bikes.createdAt)];
}

/** Every query is scoped by shop: an id from another shop reads as missing. */
@Injectable()
export class BikesRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  /** Maker, model, "maker model" and serial contain `q`, or the owner is one of `ownerIds`. */
  private matches(q: string, ownerIds: number[] = []): SQL | undefined {
    const p = `%${q}%`;
    const makerModel = like(sqlConcat(), p);
    return or(like(bikes.maker, p), like(bikes.model, p), makerModel, like(bikes.serialNumber, p), ownerIds.length ? inArray(bikes.customerId, ownerIds) : undefined);
  }

  page(shopId: number, query: BikeListQuery, ownerIds: number[]): { rows: BikeRow[]; total: number } {
    const where = and(
      eq(bikes.shopId, shopId),
      query.customerId ? eq(bikes.customerId, query.customerId) : undefined,
      query.q ? this.matches(query.q, ownerIds) : undefined,
    );
    const total = this.db.select({ n: count() }).from(bikes).where(where).get()?.n ?? 0;
    const rows = this.db
      .select()
      .from(bikes)
      .where(where)
      .orderBy(...order(query), asc(bikes.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize)
      .all();
    return { rows, total };
  }

  matchingIds(shopId: number, q: string): number[] {
    return this.db
      .select({ id: bikes.id })
      .from(bikes)
      .where(and(eq(bikes.shopId, shopId), this.matches(q)))
      .all()
      .map((r) => r.id);
  }

  listByCustomer(shopId: number, customerId: number): BikeRow[] {
    return this.db
      .select()
      .from(bikes)
      .where(and(eq(bikes.shopId, shopId), eq(bikes.customerId, customerId)))
      .orderBy(asc(bikes.maker), asc(bikes.model))
      .all();
  }

  find(shopId: number, id: number): BikeRow | undefined {
    return this.db.select().from(bikes).where(and(eq(bikes.shopId, shopId), eq(bikes.id, id))).get();
  }

  findMany(shopId: number, ids: number[]): BikeRow[] {
    if (ids.length === 0) return [];
    return this.db.select().from(bikes).where(and(eq(bikes.shopId, shopId), inArray(bikes.id, ids))).all();
  }

  insert(row: NewBikeRow): BikeRow {
    return this.db.insert(bikes).values(row).returning().get();
  }

  update(shopId: number, id: number, patch: Partial<NewBikeRow>): BikeRow | undefined {
    return this.db.update(bikes).set(patch).where(and(eq(bikes.shopId, shopId), eq(bikes.id, id))).returning().get();
  }
}

function sqlConcat(): SQL {
  return sql`${bikes.maker} || ' ' || ${bikes.model}`;
}
