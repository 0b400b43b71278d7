// Type-only: drizzle-kit loads this file without the workspace libs; value lists live in libs/domain and libs/contracts.
import type { BrakeType, CableRouting, DropoutType, FrameMaterial } from '@benchproof/domain';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { customers } from './customers.table';
import { shops } from './shops.table';

/** A bike and the specs the computations need (DESIGN.md). */
export const bikes = sqliteTable(
  'bikes',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    customerId: integer('customer_id')
      .notNull()
      .references(() => customers.id),
    maker: text('maker').notNull(),
    model: text('model').notNull(),
    year: integer('year'),
    frameMaterial: text('frame_material').$type<FrameMaterial>().notNull(),
    /** '' when not given (the API shows null). */
    size: text('size').notNull().default(''),
    colour: text('colour').notNull().default(''),
    serialNumber: text('serial_number').notNull().default(''),
    drivetrainSpeeds: integer('drivetrain_speeds').notNull(),
    brakeType: text('brake_type').$type<BrakeType>().notNull(),
    cableRouting: text('cable_routing').$type<CableRouting>().notNull(),
    dropoutType: text('dropout_type').$type<DropoutType>().notNull(),
    notes: text('notes').notNull().default(''),
    /** ISO 5775 designation such as 28-622. */
    tyreSize: text('tyre_size'),
    createdAt: timestamp('created_at').notNull(),
    updatedAt: timestamp('updated_at').notNull(),
  },
  (t) => [
    index('bikes_shop_customer_idx').on(t.shopId, t.customerId),
    index('bikes_shop_serial_idx').on(t.shopId, t.serialNumber),
    index('bikes_shop_maker_model_idx').on(t.shopId, t.maker, t.model),
  ],
);
