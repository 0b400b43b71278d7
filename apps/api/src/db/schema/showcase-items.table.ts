import { integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { shotPairs } from './shot-pairs.table';
import { shops } from './shops.table';

/** The showcase's own marks on a pair: favourite, and a caption edited for marketing. */
export const showcaseItems = sqliteTable(
  'showcase_items',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    pairId: integer('pair_id')
      .notNull()
      .references(() => shotPairs.id, { onDelete: 'cascade' }),
    favourite: integer('favourite', { mode: 'boolean' }).notNull().default(false),
    /** null until edited: the drafted caption is shown instead. */
    caption: text('caption'),
    updatedAt: timestamp('updated_at').notNull(),
  },
  (t) => [uniqueIndex('showcase_items_shop_pair_uq').on(t.shopId, t.pairId)],
);
