import { integer, primaryKey, sqliteTable } from 'drizzle-orm/sqlite-core';
import { mediaAssets } from './media-assets.table';
import { measurements } from './measurements.table';
import { shops } from './shops.table';

/**
 * The annotated photo a measurement was read from (chain wear laid over a calibrated
 * photo): which asset, and which annotation version held the ruler and the scale.
 */
export const measurementEvidence = sqliteTable(
  'measurement_evidence',
  {
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    measurementId: integer('measurement_id')
      .notNull()
      .references(() => measurements.id),
    assetId: integer('asset_id')
      .notNull()
      .references(() => mediaAssets.id),
    annotationVersion: integer('annotation_version').notNull(),
  },
  (t) => [primaryKey({ columns: [t.measurementId, t.assetId] })],
);
