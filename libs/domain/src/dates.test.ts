import { dateInputPattern, datePickerPattern, formatDate, formatWeekday, formatDateTime, formatTime, shopLocale } from './dates';

/*
 * Expected strings: Unicode CLDR 48 as shipped in Node 20's ICU 78.2 (process.versions.cldr / .icu),
 * read with `new Intl.DateTimeFormat(locale, options).format(date)`; e.g. CLDR's en-GB medium date
 * "d MMM y", en-US "MMM d, y", en-IE 24-hour "HH:mm", de-DE "dd.MM.y".
 */
const AFTERNOON = '2026-12-05T14:05:00.000Z';
const utc = { timeZone: 'UTC' };

describe('dates in the shop’s locale (CLDR 48 via Node Intl)', () => {
  it.each([
    ['en-GB', '5 Dec 2026', '5 Dec 2026, 14:05', '14:05'],
    ['en-US', 'Dec 5, 2026', 'Dec 5, 2026, 2:05 PM', '2:05 PM'],
    ['en-IE', '5 Dec 2026', '5 Dec 2026, 14:05', '14:05'],
    ['en-AU', '5 Dec 2026', '5 Dec 2026, 2:05 pm', '2:05 pm'],
    ['de-DE', '5. Dez. 2026', '5. Dez. 2026, 14:05', '14:05'],
    ['fr-FR', '5 déc. 2026', '5 déc. 2026, 14:05', '14:05'],
  ])('%s: %s · %s · %s', (locale, date, dateTime, time) => {
    expect(formatDate(AFTERNOON, locale, utc)).toBe(date);
    expect(formatDateTime(AFTERNOON, locale, utc)).toBe(dateTime);
    expect(formatTime(AFTERNOON, locale, utc)).toBe(time);
  });

  it.each([
    ['UTC', '5 Dec 2026, 14:05'],
    ['Europe/London', '5 Dec 2026, 14:05'],
    ['America/New_York', '5 Dec 2026, 9:05'],
    ['Pacific/Auckland', '6 Dec 2026, 3:05'],
  ])('an instant is shown in the reader’s zone: %s → %s (IANA tz data)', (timeZone, expected) => {
    expect(formatDateTime(AFTERNOON, 'en-GB', { timeZone })).toBe(expected);
  });

  it('a calendar day ("2026-12-19", a promised date) is the same day in every zone', () => {
    for (const timeZone of ['Pacific/Auckland', 'America/Los_Angeles', 'UTC']) expect(formatDate('2026-12-19', 'en-GB', { timeZone })).toBe('19 Dec 2026');
    expect(formatDate('2026-12-19', 'en-US')).toBe('Dec 19, 2026');
  });

  it.each([
    ['en-GB', 'Sat, 5 Dec 2026', 'ddd, D MMM YYYY'],
    ['en-US', 'Sat, Dec 5, 2026', 'ddd, MMM D, YYYY'],
    ['de-DE', 'Sa., 5. Dez. 2026', 'ddd, D. MMM YYYY'],
  ])('a promised day with its weekday in %s: %s; date pickers show %s', (locale, day, pattern) => {
    expect(formatWeekday('2026-12-05', locale)).toBe(day);
    expect(datePickerPattern(locale)).toBe(pattern);
  });

  it('no date is a dash', () => {
    expect([formatDate(null, 'en-GB'), formatDateTime(undefined, 'en-US'), formatTime(null, 'en-GB')]).toEqual(['—', '—', '—']);
  });

  it.each([
    ['en-GB', 'DD/MM/YYYY'],
    ['en-US', 'MM/DD/YYYY'],
    ['en-IE', 'DD/MM/YYYY'],
    ['de-DE', 'DD.MM.YYYY'],
    ['en-CA', 'YYYY-MM-DD'],
  ])('date inputs in %s read %s', (locale, pattern) => {
    expect(dateInputPattern(locale)).toBe(pattern);
  });

  it.each([
    [{ currency: 'GBP' }, 'en-GB'],
    [{ currency: 'USD' }, 'en-US'],
    [{ currency: 'EUR' }, 'en-IE'],
    [{ currency: 'CAD' }, 'en-CA'],
    [{ currency: 'CHF' }, 'en-GB'],
    [{ currency: 'GBP', locale: 'en-US' }, 'en-US'],
    [{ currency: 'USD', locale: null }, 'en-US'],
    [{ currency: 'EUR', locale: 'xx-YY' }, 'en-IE'],
  ])('shop %o writes dates as %s (its choice, else from its currency)', (shop, locale) => {
    expect(shopLocale(shop)).toBe(locale);
  });
});
