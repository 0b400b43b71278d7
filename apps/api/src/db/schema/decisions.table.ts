// Type-only: drizzle-kit loads this file without the workspace libs; value lists live in libs/domain and libs/contracts.
import type { DecisionChannel, DecisionStatus } from '@benchproof/contracts';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { recommendations } from './recommendations.table';
import { shops } from './shops.table';
import { users } from './users.table';

/**
 * The owner's decision on a recommendation, one row per decision taken (history).
 * Staff record decisions taken by phone or in person (recordedBy = the user);
 * the owner page records them itself (channel owner_link, recordedBy null).
 */
export const decisions = sqliteTable(
  'decisions',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    recommendationId: integer('recommendation_id')
      .notNull()
      .references(() => recommendations.id),
    status: text('status').$type<DecisionStatus>().notNull(),
    channel: text('channel').$type<DecisionChannel>().notNull(),
    decidedByName: text('decided_by_name').notNull(),
    recordedBy: integer('recorded_by').references(() => users.id),
    note: text('note').notNull().default(''),
    decidedAt: timestamp('decided_at').notNull(),
    recordedAt: timestamp('recorded_at').notNull(),
  },
  (t) => [index('decisions_shop_job_idx').on(t.shopId, t.jobId), index('decisions_recommendation_idx').on(t.recommendationId)],
);
