import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { shops } from './shops.table';
import { users } from './users.table';

/** What a single-use e-mailed link does: set a new password, or confirm a self-service sign-up. */
export type AccountTokenPurpose = 'password_reset' | 'signup_verify';

/**
 * Single-use links sent by e-mail for an existing account. Only the SHA-256 of the token is kept,
 * so a copy of the database cannot be turned into working links.
 */
export const accountTokens = sqliteTable(
  'account_tokens',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id),
    purpose: text('purpose').$type<AccountTokenPurpose>().notNull(),
    tokenHash: text('token_hash').notNull(),
    createdAt: timestamp('created_at').notNull(),
    expiresAt: timestamp('expires_at').notNull(),
    usedAt: timestamp('used_at'),
  },
  (t) => [uniqueIndex('account_tokens_hash_unique').on(t.tokenHash), index('account_tokens_user_idx').on(t.shopId, t.userId)],
);
