// Type-only: drizzle-kit loads this file without the workspace libs.
import type { Condition, InspectionArea } from '@benchproof/domain';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { checkpoints } from './checkpoints.table';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/** Something wrong found on the bike; media links arrive in a separate table (media feature). */
export const findings = sqliteTable(
  'findings',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    checkpointId: integer('checkpoint_id').references(() => checkpoints.id),
    area: text('area').$type<InspectionArea>().notNull(),
    condition: text('condition').$type<Condition>().notNull(),
    description: text('description').notNull(),
    createdBy: integer('created_by').references(() => users.id),
    createdAt: timestamp('created_at').notNull(),
    updatedAt: timestamp('updated_at').notNull(),
  },
  (t) => [index('findings_shop_job_idx').on(t.shopId, t.jobId)],
);
