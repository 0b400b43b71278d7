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
  },
  (t) => [uniqueIndex('users_email_unique').on(t.email), index('users_shop_idx').on(t.shopId)],
);
