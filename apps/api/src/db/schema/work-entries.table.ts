import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/** What was done on the bench, with parts used and minutes spent. */
export const workEntries = sqliteTable(
  'work_entries',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    description: text('description').notNull(),
    partsUsed: text('parts_used').notNull().default(''),
    minutes: integer('minutes').notNull(),
    /** Charged to the owner at `rateMinor` per hour (the shop's labour rate when logged); null = not charged. */
    rateMinor: integer('rate_minor'),
    userId: integer('user_id').references(() => users.id),
    at: timestamp('at').notNull(),
  },
  (t) => [index('work_entries_shop_job_idx').on(t.shopId, t.jobId)],
);
