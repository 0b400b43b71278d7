import isoCountries from 'i18n-iso-countries';
import { COUNTRY_CODES, isCountryCode } from './countries';

// Source: i18n-iso-countries 7.14.0 (npm), whose table follows ISO 3166-1 alpha-2.
describe('country codes (ISO 3166-1 alpha-2)', () => {
  it('are exactly the reference library’s codes, sorted, each once', () => {
    expect([...COUNTRY_CODES]).toEqual(Object.keys(isoCountries.getAlpha2Codes()).sort());
  });
  it.each([
    ['GB', true],
    ['DE', true],
    ['US', true],
    ['UK', false], // not an ISO code (the United Kingdom is GB)
    ['gb', false],
    ['ZZ', false],
    ['GBR', false],
  ])('%s → %s', (code, ok) => {
    expect(isCountryCode(code)).toBe(ok);
  });
});
