import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import type { ReportSnapshot } from './report-snapshot';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/**
 * A rendered bench report of a job. Drafts are previews; an issued row is a
 * numbered version whose PDF, SHA-256 and contents never change once ready
 * (re-issuing adds a new row). `snapshot` is the report's data frozen when the
 * draft was made, so the issued version shows exactly what desk previewed.
 */
export const reports = sqliteTable(
  'reports',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    kind: text('kind', { enum: ['draft', 'issued'] }).notNull(),
    version: integer('version'),
    state: text('state', { enum: ['rendering', 'ready', 'failed'] }).notNull(),
    error: text('error'),
    pageSize: text('page_size', { enum: ['A4', 'Letter'] }).notNull(),
    snapshot: text('snapshot', { mode: 'json' }).$type<ReportSnapshot>().notNull(),
    fromDraftId: integer('from_draft_id'),
    /** SHA-256 of the snapshot plus version and issue time, printed on the last page. */
    fingerprint: text('fingerprint'),
    storageKey: text('storage_key'),
    sha256: text('sha256'),
    byteSize: integer('byte_size'),
    pageCount: integer('page_count'),
    createdBy: integer('created_by').references(() => users.id),
    createdAt: timestamp('created_at').notNull(),
    issuedAt: timestamp('issued_at'),
    renderedAt: timestamp('rendered_at'),
  },
  (t) => [
    index('reports_shop_job_idx').on(t.shopId, t.jobId),
    uniqueIndex('reports_job_version_unique').on(t.jobId, t.version),
    index('reports_sha256_idx').on(t.sha256),
    index('reports_fingerprint_idx').on(t.fingerprint),
  ],
);
