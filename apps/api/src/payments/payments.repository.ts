import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq, inArray, isNotNull } from 'drizzle-orm';
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
    const r = recommendations;
    return this.db
      .select({ jobId: r.jobId, parts: r.parts, labourHundredths: r.labourHundredths, labourRateMinor: r.labourRateMinor, taxRateBp: r.taxRateBp })
      .from(r)
      .where(and(eq(r.shopId, shopId), inArray(r.jobId, jobIds), eq(r.decisionStatus, 'approved')))
      .all();
  }

  chargedWork(shopId: number, jobIds: number[]): ChargedWork[] {
    const w = workEntries;
    return this.db
      .select({ jobId: w.jobId, minutes: w.minutes, rateMinor: w.rateMinor })
      .from(w)
      .where(and(eq(w.shopId, shopId), inArray(w.jobId, jobIds), isNotNull(w.rateMinor)))
      .all()
      .map((x) => ({ ...x, rateMinor: x.rateMinor ?? 0 }));
  }

  paymentsOf(shopId: number, jobIds: number[], tx?: DbTx): PaymentRow[] {
    return (tx ?? this.db)
      .select()
      .from(payments)
      .where(and(eq(payments.shopId, shopId), inArray(payments.jobId, jobIds)))
      .orderBy(asc(payments.at), asc(payments.id))
      .all();
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
