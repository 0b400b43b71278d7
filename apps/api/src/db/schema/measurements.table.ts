// Type-only: drizzle-kit loads this file without the workspace libs.
import type { MeasurementInputDto, MeasurementResultDto } from '@benchproof/contracts';
import type { MeasurementKind, TrendValue } from '@benchproof/domain';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { checkpoints } from './checkpoints.table';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/** The result as stored: the verdict shown to people plus the plottable value for the wear trend. */
export type StoredMeasurementResult = MeasurementResultDto & { trend: TrendValue | null };

/** A typed reading as entered (input) and what libs/domain computed from it (result). */
export const measurements = sqliteTable(
  'measurements',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    checkpointId: integer('checkpoint_id').references(() => checkpoints.id),
    kind: text('kind').$type<MeasurementKind>().notNull(),
    input: text('input', { mode: 'json' }).$type<MeasurementInputDto>().notNull(),
    result: text('result', { mode: 'json' }).$type<StoredMeasurementResult>().notNull(),
    /** The unit the mechanic read in ("mm", "in", "gauge_pct", "grade"). */
    unit: text('unit').notNull(),
    userId: integer('user_id').references(() => users.id),
    at: timestamp('at').notNull(),
  },
  (t) => [index('measurements_shop_job_idx').on(t.shopId, t.jobId), index('measurements_checkpoint_idx').on(t.checkpointId)],
);
