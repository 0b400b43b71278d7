import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { ownerLinks } from './owner-links.table';
import { shops } from './shops.table';
import { users } from './users.table';

/**
 * The owner's marketing consent for one job, one row per change (history);
 * the latest row is the one in force. The scope is fixed by the wording
 * version (photos of the bike only, no people) plus whether the make and
 * model may be named.
 */
export const consents = sqliteTable(
  'consents',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id),
    granted: integer('granted', { mode: 'boolean' }).notNull(),
    nameMakeModel: integer('name_make_model', { mode: 'boolean' }).notNull(),
    wordingVersion: text('wording_version').notNull(),
    method: text('method', { enum: ['owner_link', 'in_person'] }).notNull(),
    /** The owner's name as given (in person) or as on the job (owner link). */
    givenByName: text('given_by_name').notNull(),
    /** Staff member who recorded an in-person consent; null on the owner page. */
    recordedBy: integer('recorded_by').references(() => users.id),
    ownerLinkId: integer('owner_link_id').references(() => ownerLinks.id),
    at: timestamp('at').notNull(),
  },
  (t) => [index('consents_shop_job_idx').on(t.shopId, t.jobId, t.at)],
);
