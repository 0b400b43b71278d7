// Type-only: drizzle-kit loads this file without the workspace libs.
import type { Condition, InspectionArea } from '@benchproof/domain';
import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/** One inspection item of a job; condition stays null until inspected. */
export const checkpoints = sqliteTable(
  'checkpoints',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    area: text('area').$type<InspectionArea>().notNull(),
    key: text('key').notNull(),
    label: text('label').notNull(),
    position: integer('position').notNull(),
    safetyCritical: integer('safety_critical', { mode: 'boolean' }).notNull().default(false),
    condition: text('condition').$type<Condition>(),
    notes: text('notes').notNull().default(''),
    inspectedBy: integer('inspected_by').references(() => users.id),
    inspectedAt: timestamp('inspected_at'),
  },
  (t) => [uniqueIndex('checkpoints_job_key_unique').on(t.jobId, t.key), index('checkpoints_shop_job_idx').on(t.shopId, t.jobId)],
);
