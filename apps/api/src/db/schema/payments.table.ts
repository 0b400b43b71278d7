import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

export type PaymentMethod = 'online' | 'card_terminal' | 'cash' | 'bank_transfer';
export type PaymentKind = 'payment' | 'refund';

/**
 * Money received for a job (kind 'payment') or given back (kind 'refund', against one payment).
 * Amounts are positive integer minor units; the balance adds refunds and subtracts payments.
 * Online rows are written only from a verified provider webhook; `providerRef` (the provider's
 * payment or refund id) is unique, so a replayed webhook cannot record a second row.
 */
export const payments = sqliteTable(
  'payments',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    kind: text('kind').$type<PaymentKind>().notNull(),
    method: text('method').$type<PaymentMethod>().notNull(),
    amountMinor: integer('amount_minor').notNull(),
    currency: text('currency').notNull(),
    /** The payment a refund gives money back on. */
    refundOf: integer('refund_of'),
    /** Who took the money at the counter, or the manager who refunded; null for an online payment. */
    staffId: integer('staff_id').references(() => users.id),
    note: text('note').notNull().default(''),
    providerRef: text('provider_ref'),
    /** Set when an online amount did not match what was due at the time: desk must look at it. */
    flag: text('flag'),
    flagClearedAt: timestamp('flag_cleared_at'),
    at: timestamp('at').notNull(),
  },
  (t) => [index('payments_shop_job_idx').on(t.shopId, t.jobId), uniqueIndex('payments_provider_ref_unique').on(t.providerRef)],
);

export type CheckoutStatus = 'open' | 'complete' | 'expired';

/** A hosted checkout the owner was sent to; one per job and amount (the idempotency key). */
export const checkoutSessions = sqliteTable(
  'checkout_sessions',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    providerId: text('provider_id').notNull(),
    idempotencyKey: text('idempotency_key').notNull(),
    amountMinor: integer('amount_minor').notNull(),
    currency: text('currency').notNull(),
    url: text('url').notNull(),
    status: text('status').$type<CheckoutStatus>().notNull(),
    createdAt: timestamp('created_at').notNull(),
  },
  (t) => [uniqueIndex('checkout_sessions_provider_unique').on(t.providerId), index('checkout_sessions_shop_job_idx').on(t.shopId, t.jobId)],
);
