import { index, integer, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { mediaAssets } from './media-assets.table';
import { shops } from './shops.table';
import { users } from './users.table';

/**
 * A before and an after shot of the same job, shown side by side or with a slider.
 * The optional crop is one rectangle in normalised coordinates (0..1) of the upright
 * image, applied to both shots so they show the same region.
 */
export const shotPairs = sqliteTable(
  'shot_pairs',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    beforeAssetId: integer('before_asset_id')
      .notNull()
      .references(() => mediaAssets.id),
    afterAssetId: integer('after_asset_id')
      .notNull()
      .references(() => mediaAssets.id),
    caption: text('caption').notNull().default(''),
    position: integer('position').notNull(),
    cropX: real('crop_x'),
    cropY: real('crop_y'),
    cropW: real('crop_w'),
    cropH: real('crop_h'),
    createdBy: integer('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at').notNull(),
    updatedAt: timestamp('updated_at').notNull(),
  },
  (t) => [index('shot_pairs_shop_job_idx').on(t.shopId, t.jobId), uniqueIndex('shot_pairs_job_before_after_uq').on(t.jobId, t.beforeAssetId, t.afterAssetId)],
);
