import { UpdateShopSettingsRequestSchema } from './shops';

// The list itself is checked against i18n-iso-countries in libs/domain countries.test.ts.
describe('shop settings: country', () => {
  it.each(['GB', 'DE', 'US', 'IE'])('accepts %s', (country) => {
    expect(UpdateShopSettingsRequestSchema.safeParse({ country }).success).toBe(true);
  });
  it.each(['ZZ', 'gb', 'GBR', 'UK', ''])('refuses %j with a plain message', (country) => {
    const res = UpdateShopSettingsRequestSchema.safeParse({ country });
    expect(res.success).toBe(false);
    expect(res.error?.issues[0].message).toBe('Choose the country from the list');
  });
});
