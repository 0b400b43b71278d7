import { COUNTRY_CODES, UpdateShopSettingsRequestSchema } from './shops';

// ISO 3166-1 alpha-2 through i18n-iso-countries (its table follows the ISO 3166 Maintenance Agency's list).
describe('shop settings: country', () => {
  it.each(['GB', 'DE', 'US', 'IE'])('accepts %s', (country) => {
    expect(UpdateShopSettingsRequestSchema.safeParse({ country }).success).toBe(true);
  });
  it.each(['ZZ', 'gb', 'GBR', 'UK', ''])('refuses %j with a plain message', (country) => {
    const res = UpdateShopSettingsRequestSchema.safeParse({ country });
    expect(res.success).toBe(false);
    expect(res.error?.issues[0].message).toBe('Choose the country from the list');
  });
  it('offers every officially assigned code once (249 of them, a count from memory; the library adds XK)', () => {
    expect(new Set(COUNTRY_CODES).size).toBe(COUNTRY_CODES.length);
    expect(COUNTRY_CODES.length).toBeGreaterThanOrEqual(249);
    expect(COUNTRY_CODES.every((c) => /^[A-Z]{2}$/.test(c))).toBe(true);
  });
});
