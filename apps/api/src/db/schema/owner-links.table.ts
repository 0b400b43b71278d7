import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';
import { users } from './users.table';

/**
 * A private link to one job's owner page. Only the SHA-256 of the token is
 * kept: the token itself is shown once to desk and sent to the owner, so a
 * copy of the database cannot be turned into working links.
 */
export const ownerLinks = sqliteTable(
  'owner_links',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    tokenHash: text('token_hash').notNull(),
    createdBy: integer('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at').notNull(),
    expiresAt: timestamp('expires_at').notNull(),
    revokedAt: timestamp('revoked_at'),
    revokedBy: integer('revoked_by').references(() => users.id),
    lastViewedAt: timestamp('last_viewed_at'),
    /** Where desk sent it, if by e-mail ('' when only copied for a text message). */
    sentTo: text('sent_to').notNull().default(''),
  },
  (t) => [uniqueIndex('owner_links_token_hash_unique').on(t.tokenHash), index('owner_links_shop_job_idx').on(t.shopId, t.jobId)],
);
