// Type-only: drizzle-kit loads this file without the workspace libs; value lists live in libs/domain and libs/contracts.
import type { Role } from '@benchproof/contracts';
import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { shops } from './shops.table';

export const users = sqliteTable(
  'users',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    email: text('email').notNull(),
    name: text('name').notNull(),
    role: text('role').$type<Role>().notNull(),
    passwordHash: text('password_hash').notNull(),
    active: integer('active', { mode: 'boolean' }).notNull().default(true),
    createdAt: timestamp('created_at').notNull(),
    /** TOTP secret (base32), sealed with AES-256-GCM under a key derived from the session secret; null = no second factor. */
    totpSecret: text('totp_secret'),
    /** Set when enrolment was confirmed with a first code; a secret without it is an unfinished enrolment. */
    totpEnabledAt: timestamp('totp_enabled_at'),
    /** The last accepted TOTP time step, so the same code cannot be used twice. */
    totpLastStep: integer('totp_last_step'),
  },
  (t) => [uniqueIndex('users_email_unique').on(t.email), index('users_shop_idx').on(t.shopId)],
);
