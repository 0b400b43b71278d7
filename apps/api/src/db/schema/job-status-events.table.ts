// Type-only: drizzle-kit loads this file without the workspace libs.
import type { JobStatus } from '@benchproof/domain';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/** Status history of a job; `fromStatus` is null for the booking-in row. */
export const jobStatusEvents = sqliteTable(
  'job_status_events',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    fromStatus: text('from_status').$type<JobStatus>(),
    toStatus: text('to_status').$type<JobStatus>().notNull(),
    userId: integer('user_id').references(() => users.id),
    note: text('note').notNull().default(''),
    at: timestamp('at').notNull(),
  },
  (t) => [index('job_status_events_job_idx').on(t.shopId, t.jobId)],
);
