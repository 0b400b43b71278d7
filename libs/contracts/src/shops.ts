import { z } from 'zod';

const hexColour = z.string().regex(/^#[0-9a-fA-F]{6}$/, 'A colour like #1F5F5B');

export const ChainLimitsSchema = z.object({
  replaceAt11Pct: z.number().positive().max(2),
  replaceAt10Pct: z.number().positive().max(2),
  cassettePct: z.number().positive().max(3),
});
export type ChainLimits = z.infer<typeof ChainLimitsSchema>;

export const ShopSettingsSchema = z.object({
  name: z.string().trim().min(2).max(120),
  address: z.string().max(400),
  email: z.union([z.email(), z.literal('')]),
  phone: z.string().max(40),
  labourRateMinor: z.number().int().min(0).max(10_000_000),
  taxRateBp: z.number().int().min(0).max(10_000),
  currency: z.string().regex(/^[A-Z]{3}$/, 'An ISO 4217 code such as EUR'),
  units: z.enum(['metric', 'imperial']),
  pageSize: z.enum(['A4', 'Letter']),
  finalCheckSecondPerson: z.boolean(),
  chainLimits: ChainLimitsSchema.nullable(),
  brandPrimary: hexColour,
  brandAccent: hexColour,
  reportFooter: z.string().max(1000),
});
export type ShopSettings = z.infer<typeof ShopSettingsSchema>;

export const ShopSettingsDtoSchema = ShopSettingsSchema.extend({ id: z.number().int() });
export type ShopSettingsDto = z.infer<typeof ShopSettingsDtoSchema>;

export const UpdateShopSettingsRequestSchema = ShopSettingsSchema.partial();
export type UpdateShopSettingsRequest = z.infer<typeof UpdateShopSettingsRequestSchema>;
