import { index, integer, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import type { ErrorCode, ShowcaseZipRequest } from '@benchproof/contracts';
import { id, timestamp } from './columns';
import { shops } from './shops.table';
import { users } from './users.table';

export type ShowcaseExportStatus = 'queued' | 'running' | 'done' | 'failed';

/**
 * A showcase zip made in the background (the 'showcase.export' task does the work; this row is
 * what the screen reads): status, progress, and why it failed as an error code.
 */
export const showcaseExports = sqliteTable(
  'showcase_exports',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id),
    /** The opaque key the screen polls with (`<userId>-<uuid>`), also the task key. */
    key: text('key').notNull(),
    request: text('request', { mode: 'json' }).$type<ShowcaseZipRequest>().notNull(),
    /** The pairs in the zip, checked against consent again before each download. */
    pairIds: text('pair_ids', { mode: 'json' }).$type<number[]>().notNull(),
    status: text('status').$type<ShowcaseExportStatus>().notNull(),
    progress: real('progress').notNull().default(0),
    errorCode: text('error_code').$type<ErrorCode>(),
    errorMessage: text('error_message'),
    /** Where the finished zip is stored; null until done, and again once purged after a revocation. */
    zipKey: text('zip_key'),
    createdAt: timestamp('created_at').notNull(),
    updatedAt: timestamp('updated_at').notNull(),
  },
  (t) => [uniqueIndex('showcase_exports_key_unique').on(t.key), index('showcase_exports_shop_status_idx').on(t.shopId, t.status)],
);
