import { index, integer, primaryKey, sqliteTable } from 'drizzle-orm/sqlite-core';
import { findings } from './findings.table';
import { mediaAssets } from './media-assets.table';

/** Shots that show a finding, in the order the mechanic chose. */
export const findingMedia = sqliteTable(
  'finding_media',
  {
    findingId: integer('finding_id')
      .notNull()
      .references(() => findings.id),
    assetId: integer('asset_id')
      .notNull()
      .references(() => mediaAssets.id),
    position: integer('position').notNull(),
  },
  (t) => [primaryKey({ columns: [t.findingId, t.assetId] }), index('finding_media_asset_idx').on(t.assetId)],
);
