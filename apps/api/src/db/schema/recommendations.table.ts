// Type-only: drizzle-kit loads this file without the workspace libs; value lists live in libs/domain and libs/contracts.
import type { DecisionStatus } from '@benchproof/contracts';
import type { Urgency } from '@benchproof/domain';
import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { findings } from './findings.table';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/** One parts line of a recommendation; qty may be decimal (1.5 m of housing), prices net in minor units. */
export interface RecommendationPartRow {
  description: string;
  qty: number;
  unitPriceMinor: number;
}

/**
 * What to do about one finding, priced. Labour is hundredths of an hour
 * (integers, no floats for money inputs); the shop's labour rate, tax rate and
 * currency are copied in when the recommendation is written so a quoted
 * price does not move when the settings change later.
 */
export const recommendations = sqliteTable(
  'recommendations',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    findingId: integer('finding_id')
      .notNull()
      .references(() => findings.id),
    summary: text('summary').notNull(),
    /** Set by the mechanic; null on rows written before urgency existed (read as the finding condition's default). */
    urgency: text('urgency').$type<Urgency>(),
    parts: text('parts', { mode: 'json' }).$type<RecommendationPartRow[]>().notNull(),
    labourHundredths: integer('labour_hundredths').notNull(),
    labourRateMinor: integer('labour_rate_minor').notNull(),
    taxRateBp: integer('tax_rate_bp').notNull(),
    currency: text('currency').notNull(),
    /** Latest decision, denormalised from the decisions history. */
    decisionStatus: text('decision_status').$type<DecisionStatus>().notNull().default('pending'),
    createdBy: integer('created_by').references(() => users.id),
    createdAt: timestamp('created_at').notNull(),
    updatedAt: timestamp('updated_at').notNull(),
  },
  (t) => [uniqueIndex('recommendations_finding_unique').on(t.findingId), index('recommendations_shop_job_idx').on(t.shopId, t.jobId)],
);
