import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq, inArray, isNotNull, sql } from 'drizzle-orm';
import type { SQLiteColumn } from 'drizzle-orm/sqlite-core';
import { DB, type Db } from '../core/db';
import { checkoutSessions, jobs, payments, recommendations, users, workEntries } from '../db/schema';
import type { DbTx } from '../core/db';

export type PaymentRow = typeof payments.$inferSelect;
export type NewPaymentRow = typeof payments.$inferInsert;
export type CheckoutRow = typeof checkoutSessions.$inferSelect;
export type ChargedRecommendation = Pick<typeof recommendations.$inferSelect, 'jobId' | 'parts' | 'labourHundredths' | 'labourRateMinor' | 'taxRateBp'>;
export type ChargedWork = { jobId: number; minutes: number; rateMinor: number };

/**
 * Payments, refunds and checkouts, plus a read model of what is charged (approved
 * recommendations and chargeable bench time) for the balance. Every query scoped by shop.
 */
@Injectable()
export class PaymentsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  approvedRecommendations(shopId: number, jobIds: number[]): ChargedRecommendation[] {
    return this.charged().recommendations.all({ shopId, ids: JSON.stringify(jobIds) });
  }

  chargedWork(shopId: number, jobIds: number[]): ChargedWork[] {
    return this.charged()
      .work.all({ shopId, ids: JSON.stringify(jobIds) })
      .map((x) => ({ ...x, rateMinor: x.rateMinor ?? 0 }));
  }

  /** Same connection inside a transaction (better-sqlite3), so the prepared statement reads the caller's writes. */
  paymentsOf(shopId: number, jobIds: number[], _tx?: DbTx): PaymentRow[] {
    return this.charged().payments.all({ shopId, ids: JSON.stringify(jobIds) });
  }

  /**
   * The balance's three reads, prepared once (first use, after migrations) with the job ids bound as one
   * JSON list: every jobs-list page asks for 20 balances, and building and preparing three statements per
   * request cost several times more than running them (issue 22).
   */
  private charged() {
    return (this.statements ??= this.prepareCharged());
  }

  private statements: ReturnType<PaymentsRepository['prepareCharged']> | undefined;

  private prepareCharged() {
    const shopId = sql.placeholder('shopId');
    const inIds = (col: SQLiteColumn) => sql`${col} IN (SELECT value FROM json_each(${sql.placeholder('ids')}))`;
    const r = recommendations;
    const w = workEntries;
    return {
      recommendations: this.db
        .select({ jobId: r.jobId, parts: r.parts, labourHundredths: r.labourHundredths, labourRateMinor: r.labourRateMinor, taxRateBp: r.taxRateBp })
        .from(r)
        .where(and(eq(r.shopId, shopId), inIds(r.jobId), eq(r.decisionStatus, 'approved')))
        .prepare(),
      work: this.db
        .select({ jobId: w.jobId, minutes: w.minutes, rateMinor: w.rateMinor })
        .from(w)
        .where(and(eq(w.shopId, shopId), inIds(w.jobId), isNotNull(w.rateMinor)))
        .prepare(),
      payments: this.db
        .select()
        .from(payments)
        .where(and(eq(payments.shopId, shopId), inIds(payments.jobId)))
        .orderBy(asc(payments.at), asc(payments.id))
        .prepare(),
    };
  }

  readyJobIds(shopId: number): number[] {
    return this.db
      .select({ id: jobs.id })
      .from(jobs)
      .where(and(eq(jobs.shopId, shopId), eq(jobs.status, 'ready')))
      .all()
      .map((j) => j.id);
  }

  staffNames(shopId: number, ids: number[]): Map<number, string> {
    if (!ids.length) return new Map();
    const rows = this.db
      .select({ id: users.id, name: users.name })
      .from(users)
      .where(and(eq(users.shopId, shopId), inArray(users.id, ids)))
      .all();
    return new Map(rows.map((u) => [u.id, u.name]));
  }

  find(shopId: number, id: number): PaymentRow | undefined {
    return this.db
      .select()
      .from(payments)
      .where(and(eq(payments.shopId, shopId), eq(payments.id, id)))
      .get();
  }

  /** Inserts unless a row with the same provider reference exists (a replayed webhook); undefined then. */
  insert(row: NewPaymentRow, tx?: DbTx): PaymentRow | undefined {
    return (tx ?? this.db).insert(payments).values(row).onConflictDoNothing({ target: payments.providerRef }).returning().all()[0];
  }

  openCheckout(shopId: number, jobId: number, amountMinor: number): CheckoutRow | undefined {
    const c = checkoutSessions;
    return this.db
      .select()
      .from(c)
      .where(and(eq(c.shopId, shopId), eq(c.jobId, jobId), eq(c.amountMinor, amountMinor), eq(c.status, 'open')))
      .orderBy(desc(c.id))
      .get();
  }

  /** How many checkouts this job already had for this amount (the attempt number in the idempotency key). */
  checkoutCount(shopId: number, jobId: number, amountMinor: number): number {
    const c = checkoutSessions;
    return this.db
      .select({ id: c.id })
      .from(c)
      .where(and(eq(c.shopId, shopId), eq(c.jobId, jobId), eq(c.amountMinor, amountMinor)))
      .all().length;
  }

  insertCheckout(row: typeof checkoutSessions.$inferInsert): CheckoutRow {
    this.db.insert(checkoutSessions).values(row).onConflictDoNothing({ target: checkoutSessions.providerId }).run();
    return this.checkoutByProviderId(row.providerId)!;
  }

  /** Webhooks name the provider's session id only; the row tells shop and job. */
  checkoutByProviderId(providerId: string): CheckoutRow | undefined {
    return this.db.select().from(checkoutSessions).where(eq(checkoutSessions.providerId, providerId)).get();
  }

  setCheckoutStatus(id: number, status: CheckoutRow['status'], tx?: DbTx): void {
    (tx ?? this.db).update(checkoutSessions).set({ status }).where(eq(checkoutSessions.id, id)).run();
  }
}
