import { ChainLimitsSchema, UpdateShopSettingsRequestSchema } from './shops';

describe('ChainLimitsSchema (domain chainWearLimits rule)', () => {
  it('accepts the defaults (CHECKS.md B.1, common practice: 0.5 / 0.75 / 1.0 %)', () => {
    expect(ChainLimitsSchema.safeParse({ replaceAt11Pct: 0.5, replaceAt10Pct: 0.75, cassettePct: 1 }).success).toBe(true);
  });

  it('rejects the 3 % industrial limit (ANSI B29.1 via chain makers; CHECKS.md B.1 negative test)', () => {
    expect(ChainLimitsSchema.safeParse({ replaceAt11Pct: 3, replaceAt10Pct: 3, cassettePct: 3 }).success).toBe(false);
  });

  it('rejects a cassette limit below a chain limit', () => {
    const r = ChainLimitsSchema.safeParse({ replaceAt11Pct: 0.5, replaceAt10Pct: 0.75, cassettePct: 0.6 });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].path).toEqual(['cassettePct']);
  });
});

describe('UpdateShopSettingsRequestSchema', () => {
  it('accepts a partial update', () => {
    expect(UpdateShopSettingsRequestSchema.parse({ taxRateBp: 2000 })).toEqual({ taxRateBp: 2000 });
    expect(UpdateShopSettingsRequestSchema.parse({ chainLimits: null })).toEqual({ chainLimits: null });
  });

  it('rejects an empty update, bad currency, tax over 100 %, fractional labour rate', () => {
    expect(UpdateShopSettingsRequestSchema.safeParse({}).success).toBe(false);
    expect(UpdateShopSettingsRequestSchema.safeParse({ currency: 'gbp' }).success).toBe(false);
    expect(UpdateShopSettingsRequestSchema.safeParse({ currency: 'POUND' }).success).toBe(false);
    expect(UpdateShopSettingsRequestSchema.safeParse({ taxRateBp: 10001 }).success).toBe(false);
    expect(UpdateShopSettingsRequestSchema.safeParse({ labourRateMinor: 45.5 }).success).toBe(false);
    expect(UpdateShopSettingsRequestSchema.safeParse({ pageSize: 'A5' }).success).toBe(false);
  });
});
