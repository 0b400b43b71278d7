// Type-only: drizzle-kit loads this file without the workspace libs; value lists live in libs/domain and libs/contracts.
import type { ContactChannel } from '@benchproof/contracts';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { shops } from './shops.table';

/** The bike owner. Not a user: owners reach their jobs through an owner link. */
export const customers = sqliteTable(
  'customers',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    name: text('name').notNull(),
    /** '' when not given (the API shows null). */
    email: text('email').notNull().default(''),
    phone: text('phone').notNull().default(''),
    notes: text('notes').notNull().default(''),
    /** The owner replied STOP to a text: no further texts until they opt back in. */
    smsOptOutAt: timestamp('sms_opt_out_at'),
    preferredChannel: text('preferred_channel').$type<ContactChannel>().notNull().default('email'),
    createdAt: timestamp('created_at').notNull(),
    updatedAt: timestamp('updated_at').notNull(),
  },
  (t) => [index('customers_shop_name_idx').on(t.shopId, t.name), index('customers_shop_email_idx').on(t.shopId, t.email)],
);
