import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { timestamp } from './columns';
import { shops } from './shops.table';
import { users } from './users.table';

/**
 * One row per signed-in device. The session token names its row (`sid`); sign-out,
 * deactivation and a password change delete rows, which ends those tokens at once.
 */
export const sessions = sqliteTable(
  'sessions',
  {
    id: text('id').primaryKey(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at').notNull(),
    expiresAt: timestamp('expires_at').notNull(),
  },
  (t) => [index('sessions_user_idx').on(t.userId), index('sessions_expires_idx').on(t.expiresAt)],
);
