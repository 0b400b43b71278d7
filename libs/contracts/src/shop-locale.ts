/**
 * Until shops carry their own locale setting, dates are written in a locale guessed from the shop's
 * currency (common practice, no source: the usual language-region pair of the currency's home market;
 * the euro has no single one, so it gets en-IE, a day-month-year English). Unknown currencies fall back to en-GB.
 */
const BY_CURRENCY: Readonly<Record<string, string>> = {
  GBP: 'en-GB',
  EUR: 'en-IE',
  USD: 'en-US',
  CAD: 'en-CA',
  AUD: 'en-AU',
  NZD: 'en-NZ',
  CHF: 'de-CH',
  SEK: 'sv-SE',
  NOK: 'nb-NO',
  DKK: 'da-DK',
  PLN: 'pl-PL',
  CZK: 'cs-CZ',
  JPY: 'ja-JP',
};

export const defaultLocaleFor = (currency: string): string => BY_CURRENCY[currency] ?? 'en-GB';

/** A calendar date such as "12 December 2026" in the shop's locale. */
export const formatShopDate = (date: Date | string, locale: string): string =>
  new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'long', year: 'numeric' }).format(typeof date === 'string' ? new Date(date) : date);
