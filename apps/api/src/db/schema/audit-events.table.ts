import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { shops } from './shops.table';
import { users } from './users.table';

export const auditEvents = sqliteTable(
  'audit_events',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    userId: integer('user_id').references(() => users.id),
    action: text('action').notNull(),
    entityType: text('entity_type').notNull(),
    entityId: integer('entity_id'),
    details: text('details', { mode: 'json' }).$type<Record<string, unknown>>(),
    at: timestamp('at').notNull(),
  },
  (t) => [index('audit_shop_entity_idx').on(t.shopId, t.entityType, t.entityId)],
);
