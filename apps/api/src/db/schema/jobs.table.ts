// Type-only: drizzle-kit loads this file without the workspace libs.
import type { JobStatus } from '@benchproof/domain';
import { sql } from 'drizzle-orm';
import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { bikes } from './bikes.table';
import { id, timestamp } from './columns';
import { customers } from './customers.table';
import { shops } from './shops.table';
import { users } from './users.table';

/**
 * The open (not terminal) statuses as SQL literals. The open-jobs partial index and the list query both use this
 * exact text: SQLite picks a partial index only when the query repeats its condition with the same literal values
 * (bound parameters do not count). The list query checks it against the domain's statuses when it loads.
 */
export const OPEN_STATUSES_SQL = "'booked_in', 'on_stand', 'waiting_owner', 'in_work', 'final_check', 'ready'";

/** One workshop visit of one bike. */
export const jobs = sqliteTable(
  'jobs',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    number: text('number').notNull(),
    bikeId: integer('bike_id')
      .notNull()
      .references(() => bikes.id),
    customerId: integer('customer_id')
      .notNull()
      .references(() => customers.id),
    status: text('status').$type<JobStatus>().notNull(),
    reportedSymptoms: text('reported_symptoms').notNull().default(''),
    /** Calendar day in the shop's terms, ISO "YYYY-MM-DD". */
    promisedOn: text('promised_on'),
    mechanicId: integer('mechanic_id').references(() => users.id),
    finalCheckerId: integer('final_checker_id').references(() => users.id),
    createdBy: integer('created_by').references(() => users.id),
    bookedInAt: timestamp('booked_in_at').notNull(),
    onStandAt: timestamp('on_stand_at'),
    waitingOwnerAt: timestamp('waiting_owner_at'),
    inWorkAt: timestamp('in_work_at'),
    finalCheckAt: timestamp('final_check_at'),
    readyAt: timestamp('ready_at'),
    collectedAt: timestamp('collected_at'),
    cancelledAt: timestamp('cancelled_at'),
    /** A report e-mail to the owner is sent or on its way (kept by the mail feature; a finally failed one does not count). */
    reportSent: integer('report_sent', { mode: 'boolean' }).notNull().default(false),
    /** Desk confirmed handing the bike over with no report sent. */
    collectedWithoutReport: integer('collected_without_report', { mode: 'boolean' }).notNull().default(false),
    createdAt: timestamp('created_at').notNull(),
    updatedAt: timestamp('updated_at').notNull(),
  },
  (t) => [
    uniqueIndex('jobs_shop_number_unique').on(t.shopId, t.number),
    // The jobs list: open statuses of one shop sorted by promised day.
    index('jobs_shop_status_promised_idx').on(t.shopId, t.status, t.promisedOn, t.id),
    // The open-jobs page in its order (promised day, then oldest booking) with no sort step.
    index('jobs_open_promised_idx')
      .on(t.shopId, t.promisedOn, t.id)
      .where(sql.raw(`status IN (${OPEN_STATUSES_SQL})`)),
    index('jobs_shop_mechanic_idx').on(t.shopId, t.mechanicId),
    index('jobs_shop_promised_idx').on(t.shopId, t.promisedOn),
    index('jobs_shop_bike_idx').on(t.shopId, t.bikeId),
  ],
);
