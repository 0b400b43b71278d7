// Type-only: drizzle-kit loads this file without the workspace libs; value lists live in libs/domain and libs/contracts.
import type { Role } from '@benchproof/contracts';
import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { shops } from './shops.table';
import { users } from './users.table';

/**
 * A manager's invitation to a new staff member. The account is made when the link is used and the
 * person chooses their own password; only the SHA-256 of the link's token is kept. A resend replaces
 * the hash (the earlier link stops working) and restarts the 7 days.
 */
export const invitations = sqliteTable(
  'invitations',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    email: text('email').notNull(),
    name: text('name').notNull(),
    role: text('role').$type<Role>().notNull(),
    tokenHash: text('token_hash').notNull(),
    invitedBy: integer('invited_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at').notNull(),
    sentAt: timestamp('sent_at').notNull(),
    expiresAt: timestamp('expires_at').notNull(),
    acceptedAt: timestamp('accepted_at'),
    acceptedUserId: integer('accepted_user_id').references(() => users.id),
    withdrawnAt: timestamp('withdrawn_at'),
  },
  (t) => [uniqueIndex('invitations_token_hash_unique').on(t.tokenHash), index('invitations_shop_idx').on(t.shopId, t.email)],
);
