import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { shops } from './shops.table';
import { users } from './users.table';

/** Ten single-use codes per two-factor enrolment, shown once; only their SHA-256 is kept. */
export const recoveryCodes = sqliteTable(
  'recovery_codes',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id),
    codeHash: text('code_hash').notNull(),
    createdAt: timestamp('created_at').notNull(),
    usedAt: timestamp('used_at'),
  },
  (t) => [index('recovery_codes_user_idx').on(t.shopId, t.userId)],
);
