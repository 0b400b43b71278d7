// Type-only: drizzle-kit loads this file without the workspace libs; value lists live in libs/domain and libs/contracts.
import type { PageSize, UnitSystem } from '@benchproof/contracts';
import type { ShopLocale } from '@benchproof/domain';
import { integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';

export const shops = sqliteTable('shops', {
  id: id(),
  name: text('name').notNull(),
  address: text('address').notNull().default(''),
  email: text('email').notNull().default(''),
  phone: text('phone').notNull().default(''),
  labourRateMinor: integer('labour_rate_minor').notNull().default(0),
  taxRateBp: integer('tax_rate_bp').notNull().default(0),
  currency: text('currency').notNull().default('EUR'),
  /** How dates are written (a ShopLocale); null: the one that fits the currency. */
  locale: text('locale').$type<ShopLocale>(),
  /** ISO 3166-1 alpha-2; phone numbers typed without a country code are read as this country's. */
  country: text('country').notNull().default('GB'),
  /** Printed on receipts when set (VAT or sales-tax registration). */
  taxNumber: text('tax_number').notNull().default(''),
  units: text('units').$type<UnitSystem>().notNull().default('metric'),
  pageSize: text('page_size').$type<PageSize>().notNull().default('A4'),
  finalCheckSecondPerson: integer('final_check_second_person', { mode: 'boolean' }).notNull().default(true),
  /** Shop policy overrides for chain replacement thresholds, JSON; null = trade defaults. */
  chainLimits: text('chain_limits', { mode: 'json' }).$type<{ replaceAt11Pct: number; replaceAt10Pct: number; cassettePct: number } | null>(),
  brandPrimary: text('brand_primary').notNull().default('#1F5F5B'),
  brandAccent: text('brand_accent').notNull().default('#E0A526'),
  reportFooter: text('report_footer').notNull().default(''),
  /** Report logo: a JPEG made from the upload by the media pipeline, stored under an opaque key. */
  logoKey: text('logo_key'),
  logoSha256: text('logo_sha256'),
  logoWidth: integer('logo_width'),
  logoHeight: integer('logo_height'),
  /** Desk staff may open the showcase library (managers always may); off until a manager allows it. */
  showcaseDeskAccess: integer('showcase_desk_access', { mode: 'boolean' }).notNull().default(false),
  /** Every account of the shop must sign in with a second factor (TOTP). */
  requireTwoFactor: integer('require_two_factor', { mode: 'boolean' }).notNull().default(false),
  nextJobSeq: integer('next_job_seq').notNull().default(1),
  createdAt: timestamp('created_at').notNull(),
});
