// Type-only: drizzle-kit loads this file without the workspace libs.
import type { TorqueEntryRequest } from '@benchproof/contracts';
import type { Threadlocker, TorqueVerdict } from '@benchproof/domain';
import { index, integer, real, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/** The torque reading as stored: spec and applied values as read, and the wrench tolerance used. */
export type StoredTorqueInput = Pick<TorqueEntryRequest, 'specified' | 'applied'> & { tolerancePct: number | null };

/** One fastener tightened: specified vs applied torque, each in the unit as read, and the verdict computed. */
export const torqueEntries = sqliteTable(
  'torque_entries',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    fastener: text('fastener').notNull(),
    input: text('input', { mode: 'json' }).$type<StoredTorqueInput>().notNull(),
    result: text('result', { mode: 'json' }).$type<TorqueVerdict>().notNull(),
    specValue: real('spec_value').notNull(),
    specUnit: text('spec_unit').notNull(),
    appliedValue: real('applied_value').notNull(),
    appliedUnit: text('applied_unit').notNull(),
    specSource: text('spec_source').notNull(),
    tool: text('tool').notNull().default(''),
    /** The wrench's last calibration date (YYYY-MM-DD), as the mechanic read it off the wrench or its certificate. */
    toolCalibratedOn: text('tool_calibrated_on'),
    /** Thread-locking compound used; null = not recorded (older entries). */
    threadlocker: text('threadlocker').$type<Threadlocker>(),
    carbonPart: integer('carbon_part', { mode: 'boolean' }).notNull().default(false),
    userId: integer('user_id').references(() => users.id),
    at: timestamp('at').notNull(),
  },
  (t) => [index('torque_entries_shop_job_idx').on(t.shopId, t.jobId)],
);
