import { Inject, Injectable } from '@nestjs/common';
import type { BikeListQuery } from '@benchproof/contracts';
import { and, asc, count, desc, eq, inArray, sql, type SQL } from 'drizzle-orm';
import { DB, ftsPrefixQuery, PreparedPages, type Db } from '../core/db';
import { bikes } from '../db/schema';

export type BikeRow = typeof bikes.$inferSelect;
export type NewBikeRow = typeof bikes.$inferInsert;

function order(query: BikeListQuery): SQL[] {
  const dir = query.order === 'desc' ? desc : asc;
  return query.sort === 'maker' ? [dir(bikes.maker), dir(bikes.model)] : [dir(bikes.createdAt)];
}

function where(query: BikeListQuery, text: boolean): SQL | undefined {
  return and(
    eq(bikes.shopId, sql.placeholder('shopId')),
    query.customerId ? eq(bikes.customerId, sql.placeholder('customerId')) : undefined,
    text ? sql`${bikes.id} IN (SELECT rowid FROM bike_search WHERE bike_search MATCH ${sql.placeholder('text')})` : undefined,
  );
}

/** Every query is scoped by shop: an id from another shop reads as missing. */
@Injectable()
export class BikesRepository {
  /** Prepared once per shape (search, owner filter, sort, direction); a request only binds values. */
  private readonly prepared = new PreparedPages<BikeRow>();

  constructor(@Inject(DB) private readonly db: Db) {}

  /** Maker, model, serial or the owner's name start with what was typed (bike_search FTS5 index). */
  page(shopId: number, query: BikeListQuery): { rows: BikeRow[]; total: number } {
    const text = query.q ? ftsPrefixQuery(query.q) : null;
    if (query.q && text === null) return { rows: [], total: 0 };
    const shape = [text !== null, !!query.customerId, query.sort, query.order].join('|');
    const values = { shopId, text, customerId: query.customerId, limit: query.pageSize, offset: (query.page - 1) * query.pageSize };
    return this.prepared.run(shape, values, {
      total: () =>
        this.db
          .select({ n: count() })
          .from(bikes)
          .where(where(query, text !== null))
          .prepare(),
      page: () => this.buildPage(query, text !== null),
    });
  }

  private buildPage(query: BikeListQuery, text: boolean) {
    return this.db
      .select()
      .from(bikes)
      .where(where(query, text))
      .orderBy(...order(query), asc(bikes.id))
      .limit(sql.placeholder('limit'))
      .offset(sql.placeholder('offset'))
      .prepare();
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
    return this.db
      .select()
      .from(bikes)
      .where(and(eq(bikes.shopId, shopId), eq(bikes.id, id)))
      .get();
  }

  findMany(shopId: number, ids: number[]): BikeRow[] {
    if (ids.length === 0) return [];
    return this.db
      .select()
      .from(bikes)
      .where(and(eq(bikes.shopId, shopId), inArray(bikes.id, ids)))
      .all();
  }

  insert(row: NewBikeRow): BikeRow {
    return this.db.insert(bikes).values(row).returning().all()[0];
  }

  update(shopId: number, id: number, patch: Partial<NewBikeRow>): BikeRow | undefined {
    return this.db
      .update(bikes)
      .set(patch)
      .where(and(eq(bikes.shopId, shopId), eq(bikes.id, id)))
      .returning()
      .all()[0];
  }
}
