// Type-only: drizzle-kit loads this file without the workspace libs.
import type { DerivativeStatus } from '@benchproof/contracts';
import type { MediaArea, MediaKind, MediaPhase, MediaSource } from '@benchproof/domain';
import { type AnySQLiteColumn, index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/**
 * One uploaded photo or video. The original is stored once under `originalKey`
 * (built from ids only) and never changes; `originalName` is kept as metadata and
 * is never used as a path.
 */
export const mediaAssets = sqliteTable(
  'media_assets',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    kind: text('kind').$type<MediaKind>().notNull(),
    phase: text('phase').$type<MediaPhase>().notNull(),
    area: text('area').$type<MediaArea>().notNull(),
    source: text('source').$type<MediaSource>().notNull(),
    caption: text('caption').notNull().default(''),
    originalKey: text('original_key'),
    originalName: text('original_name').notNull().default(''),
    mime: text('mime').notNull(),
    sha256: text('sha256').notNull(),
    byteSize: integer('byte_size').notNull(),
    width: integer('width'),
    height: integer('height'),
    durationMs: integer('duration_ms'),
    capturedAt: timestamp('captured_at'),
    uploadedAt: timestamp('uploaded_at').notNull(),
    uploadedBy: integer('uploaded_by')
      .notNull()
      .references(() => users.id),
    sourceAssetId: integer('source_asset_id').references((): AnySQLiteColumn => mediaAssets.id),
    timecodeMs: integer('timecode_ms'),
    derivativeStatus: text('derivative_status').$type<DerivativeStatus>().notNull(),
    derivativeError: text('derivative_error'),
    /** 64-bit DCT perceptual hash (16 hex digits) of the upright screen derivative; null until computed. */
    phash: text('phash'),
    deletedAt: timestamp('deleted_at'),
    deletedBy: integer('deleted_by').references(() => users.id),
    purgedAt: timestamp('purged_at'),
    /** Id the uploading device made up for this shot (a UUID); the same id again returns this asset. */
    clientId: text('client_id'),
  },
  (t) => [
    index('media_assets_shop_job_idx').on(t.shopId, t.jobId),
    index('media_assets_status_idx').on(t.derivativeStatus),
    uniqueIndex('media_assets_shop_client_idx').on(t.shopId, t.clientId),
  ],
);
