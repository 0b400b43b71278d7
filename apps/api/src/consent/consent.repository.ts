import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { consents } from '../db/schema';

export type ConsentRow = typeof consents.$inferSelect;
export type NewConsentRow = typeof consents.$inferInsert;

/** Consent history per job; every query scoped by shop. */
@Injectable()
export class ConsentRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  insert(row: NewConsentRow): ConsentRow {
    return this.db.insert(consents).values(row).returning().all()[0];
  }

  /** Newest first; ties on time broken by id so the latest write wins. */
  history(shopId: number, jobId: number): ConsentRow[] {
    return this.db
      .select()
      .from(consents)
      .where(and(eq(consents.shopId, shopId), eq(consents.jobId, jobId)))
      .orderBy(desc(consents.at), desc(consents.id))
      .all();
  }

  /** Every consent row of the shop, newest first (the showcase keeps the first per job). */
  allNewestFirst(shopId: number): ConsentRow[] {
    return this.db.select().from(consents).where(eq(consents.shopId, shopId)).orderBy(desc(consents.at), desc(consents.id)).all();
  }
}
