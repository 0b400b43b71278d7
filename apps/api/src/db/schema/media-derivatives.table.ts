// Type-only: drizzle-kit loads this file without the workspace libs; value lists live in libs/domain and libs/contracts.
import type { MediaVariant } from '@benchproof/contracts';
import { integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id } from './columns';
import { mediaAssets } from './media-assets.table';

/** An upright, sRGB, metadata-free JPEG made from an asset (or, for a video, its poster frame). */
export const mediaDerivatives = sqliteTable(
  'media_derivatives',
  {
    id: id(),
    assetId: integer('asset_id')
      .notNull()
      .references(() => mediaAssets.id),
    variant: text('variant').$type<MediaVariant>().notNull(),
    key: text('key').notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    bytes: integer('bytes').notNull(),
    sha256: text('sha256').notNull(),
  },
  (t) => [uniqueIndex('media_derivatives_asset_variant_unique').on(t.assetId, t.variant)],
);
