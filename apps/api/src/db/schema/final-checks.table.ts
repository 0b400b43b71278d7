import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/** A final check of a job by a checker; a failed one sends the job back to work. */
export const finalChecks = sqliteTable(
  'final_checks',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    checkerId: integer('checker_id')
      .notNull()
      .references(() => users.id),
    passed: integer('passed', { mode: 'boolean' }).notNull(),
    /** FINAL_CHECK_ITEMS (libs/domain) → passed. */
    items: text('items', { mode: 'json' }).$type<Record<string, boolean>>(),
    testRideNotes: text('test_ride_notes'),
    notes: text('notes').notNull().default(''),
    at: timestamp('at').notNull(),
  },
  (t) => [index('final_checks_shop_job_idx').on(t.shopId, t.jobId)],
);
