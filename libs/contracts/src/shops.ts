import { chainWearLimits, isCountryCode, MAX_BICYCLE_CHAIN_LIMIT_PCT, SHOP_LOCALES } from '@benchproof/domain';
import { z } from 'zod';
import { IdSchema, requiredText } from './common';

export const UNIT_SYSTEMS = ['metric', 'imperial'] as const;
export const UnitSystemSchema = z.enum(UNIT_SYSTEMS);
export type UnitSystem = z.infer<typeof UnitSystemSchema>;

export const PAGE_SIZES = ['A4', 'Letter'] as const;
export const PageSizeSchema = z.enum(PAGE_SIZES);
export type PageSize = z.infer<typeof PageSizeSchema>;

/** ISO 4217 alphabetic code, e.g. GBP, EUR, USD. */
export const CurrencySchema = z.string().regex(/^[A-Z]{3}$/, 'Use a 3-letter ISO 4217 code, e.g. GBP');

const limitPct = z.number().positive().max(MAX_BICYCLE_CHAIN_LIMIT_PCT);

/**
 * A shop's chain replace-at policy (%), checked with the same rule the
 * computation uses (domain chainWearLimits): positive, at most 2 %, cassette
 * limit not below a chain limit.
 */
export const ChainLimitsSchema = z.object({ replaceAt11Pct: limitPct, replaceAt10Pct: limitPct, cassettePct: limitPct }).superRefine((policy, ctx) => {
  try {
    chainWearLimits(11, policy);
  } catch (error) {
    ctx.addIssue({ code: 'custom', path: ['cassettePct'], message: (error as Error).message });
  }
});
export type ChainLimits = z.infer<typeof ChainLimitsSchema>;

const hexColour = z.string().regex(/^#[0-9a-fA-F]{6}$/, 'A colour like #1F5F5B');

const settingsFields = {
  name: requiredText(120),
  address: z.string().trim().max(500),
  email: z.union([z.email(), z.literal('')]),
  phone: z.string().max(40),
  /** Report branding; the settings page checks contrast (WCAG 2.2) before saving. */
  brandPrimary: hexColour,
  brandAccent: hexColour,
  reportFooter: z.string().max(1000),
  /** Labour rate per hour in minor units (pence, cents). */
  labourRateMinor: z.int().min(0).max(1_000_000),
  /** Tax rate in basis points: 2000 = 20 %. */
  taxRateBp: z.int().min(0).max(10_000),
  currency: CurrencySchema,
  /** How dates and times are written (web, e-mail, PDF); null: the one that fits the currency (domain shopLocale). */
  locale: z.enum(SHOP_LOCALES).nullable(),
  /** ISO 3166-1 alpha-2: phone numbers typed without a country code are read as this country's. */
  country: z.string().refine((c): boolean => isCountryCode(c), 'Choose the country from the list'),
  /** Printed on receipts when set. */
  taxNumber: z.string().trim().max(40),
  units: UnitSystemSchema,
  pageSize: PageSizeSchema,
  /** Final check must be signed off by someone other than the mechanic. */
  finalCheckSecondPerson: z.boolean(),
  /** Null: the BenchProof defaults (0.5 / 0.75 / 1.0 %). */
  chainLimits: ChainLimitsSchema.nullable(),
  /** The front desk may open the showcase library and export from it (managers always may). */
  showcaseDeskAccess: z.boolean(),
};

export const ShopSettingsDtoSchema = z.object({
  id: IdSchema,
  ...settingsFields,
  /** The report logo (a shop-level image made by the media pipeline), or null. */
  logo: z.object({ url: z.string(), width: z.number().int(), height: z.number().int() }).nullable(),
  /** The locale in force: `locale`, else the one from the currency. Every date is written with it. */
  dateLocale: z.enum(SHOP_LOCALES),
  /** Every account must sign in with a second factor (changed through PUT /api/shop/two-factor). */
  requireTwoFactor: z.boolean(),
});
export type ShopSettingsDto = z.infer<typeof ShopSettingsDtoSchema>;

/** Partial update: only the fields sent change; chainLimits null resets to defaults. */
export const UpdateShopSettingsRequestSchema = z
  .object(settingsFields)
  .partial()
  .refine((v) => Object.values(v).some((x) => x !== undefined), 'Nothing to update');
export type UpdateShopSettingsRequest = z.infer<typeof UpdateShopSettingsRequestSchema>;
