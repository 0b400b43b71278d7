import { migrateDocument, type AnnotationDocument } from '@benchproof/annotation';
import { customType, index, integer, sqliteTable, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { mediaAssets } from './media-assets.table';
import { shops } from './shops.table';
import { users } from './users.table';

/**
 * An annotation document stored as JSON text: written as it is, read through the lib's
 * migrations, so every reader gets the current schema version with its type, never a cast.
 */
const annotationDocument = customType<{ data: AnnotationDocument; driverData: string }>({
  dataType: () => 'text',
  toDriver: (doc) => JSON.stringify(doc),
  fromDriver: (json) => migrateDocument(JSON.parse(json)),
});

/**
 * Every saved state of a photo's annotation (autosave appends a version; the latest
 * is the annotation). The photo itself is never changed. `document` is the JSON shape
 * document with its own schemaVersion, migrated on read.
 */
export const annotationVersions = sqliteTable(
  'annotation_versions',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    assetId: integer('asset_id')
      .notNull()
      .references(() => mediaAssets.id),
    version: integer('version').notNull(),
    document: annotationDocument('document').notNull(),
    savedAt: timestamp('saved_at').notNull(),
    savedBy: integer('saved_by')
      .notNull()
      .references(() => users.id),
  },
  (t) => [uniqueIndex('annotation_versions_asset_version_unique').on(t.assetId, t.version), index('annotation_versions_shop_idx').on(t.shopId)],
);
