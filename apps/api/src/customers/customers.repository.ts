import { Inject, Injectable } from '@nestjs/common';
import type { CustomerListQuery } from '@benchproof/contracts';
import { and, asc, count, desc, eq, inArray, sql } from 'drizzle-orm';
import { DB, ftsPrefixQuery, PreparedPages, type Db } from '../core/db';
import { customers } from '../db/schema';

export type CustomerRow = typeof customers.$inferSelect;
export type NewCustomerRow = typeof customers.$inferInsert;

const SORT_COLUMN = { name: customers.name, createdAt: customers.createdAt } as const;

/** Every query is scoped by shop: an id from another shop reads as missing. */
@Injectable()
export class CustomersRepository {
  /** Prepared once per shape (search or not, sort, direction); a request only binds values. */
  private readonly prepared = new PreparedPages<CustomerRow>();

  constructor(@Inject(DB) private readonly db: Db) {}

  /** Name, e-mail or phone words start with what was typed (customer_search FTS5 index). */
  page(shopId: number, query: CustomerListQuery): { rows: CustomerRow[]; total: number } {
    const text = query.q ? ftsPrefixQuery(query.q) : null;
    if (query.q && text === null) return { rows: [], total: 0 };
    const shape = [text !== null, query.sort, query.order].join('|');
    const values = { shopId, text, limit: query.pageSize, offset: (query.page - 1) * query.pageSize };
    return this.prepared.run(shape, values, {
      total: () =>
        this.db
          .select({ n: count() })
          .from(customers)
          .where(this.where(text !== null))
          .prepare(),
      page: () => this.buildPage(query, text !== null),
    });
  }

  private where(text: boolean) {
    return and(
      eq(customers.shopId, sql.placeholder('shopId')),
      text ? sql`${customers.id} IN (SELECT rowid FROM customer_search WHERE customer_search MATCH ${sql.placeholder('text')})` : undefined,
    );
  }

  private buildPage(query: CustomerListQuery, text: boolean) {
    return this.db
      .select()
      .from(customers)
      .where(this.where(text))
      .orderBy((query.order === 'desc' ? desc : asc)(SORT_COLUMN[query.sort]), asc(customers.id))
      .limit(sql.placeholder('limit'))
      .offset(sql.placeholder('offset'))
      .prepare();
  }

  find(shopId: number, id: number): CustomerRow | undefined {
    return this.db
      .select()
      .from(customers)
      .where(and(eq(customers.shopId, shopId), eq(customers.id, id)))
      .get();
  }

  /** Every customer's contact fields in the shop, for matching an import against (id, name, e-mail, phone). */
  contacts(shopId: number): Array<Pick<CustomerRow, 'id' | 'name' | 'email' | 'phone' | 'notes'>> {
    return this.db
      .select({ id: customers.id, name: customers.name, email: customers.email, phone: customers.phone, notes: customers.notes })
      .from(customers)
      .where(eq(customers.shopId, shopId))
      .orderBy(asc(customers.id))
      .all();
  }

  findMany(shopId: number, ids: number[]): CustomerRow[] {
    if (ids.length === 0) return [];
    return this.db
      .select()
      .from(customers)
      .where(and(eq(customers.shopId, shopId), inArray(customers.id, ids)))
      .all();
  }

  insert(row: NewCustomerRow): CustomerRow {
    return this.db.insert(customers).values(row).returning().all()[0];
  }

  update(shopId: number, id: number, patch: Partial<NewCustomerRow>): CustomerRow | undefined {
    return this.db
      .update(customers)
      .set(patch)
      .where(and(eq(customers.shopId, shopId), eq(customers.id, id)))
      .returning()
      .all()[0];
  }
}
