/*
 * One way to write dates and times everywhere (web, e-mail, PDF), driven by the shop's locale.
 * The words stay English; the locale decides the order (day or month first), the month
 * names' form and the 12- or 24-hour clock, as the Unicode CLDR data in the runtime's Intl says.
 */

/** Locales a shop can choose; the English variants of the regions our currencies belong to, plus a few more. */
export const SHOP_LOCALES = ['en-GB', 'en-US', 'en-IE', 'en-AU', 'en-NZ', 'en-CA', 'de-DE', 'fr-FR', 'nl-NL', 'es-ES', 'it-IT'] as const;
export type ShopLocale = (typeof SHOP_LOCALES)[number];

export const SHOP_LOCALE_LABELS: Record<ShopLocale, string> = {
  'en-GB': 'English (United Kingdom)',
  'en-US': 'English (United States)',
  'en-IE': 'English (Ireland)',
  'en-AU': 'English (Australia)',
  'en-NZ': 'English (New Zealand)',
  'en-CA': 'English (Canada)',
  'de-DE': 'Deutsch (Deutschland)',
  'fr-FR': 'Français (France)',
  'nl-NL': 'Nederlands (Nederland)',
  'es-ES': 'Español (España)',
  'it-IT': 'Italiano (Italia)',
};

const BY_CURRENCY: Record<string, ShopLocale> = { GBP: 'en-GB', USD: 'en-US', EUR: 'en-IE', AUD: 'en-AU', NZD: 'en-NZ', CAD: 'en-CA' };

export const isShopLocale = (v: string): v is ShopLocale => (SHOP_LOCALES as readonly string[]).includes(v);

/**
 * The shop's locale: its own choice, else one that fits its currency. Euro shops get English
 * (Ireland): English words with the day-first dates and 24-hour clock of the euro area. Any
 * other currency gets en-GB (day first), the more common order worldwide.
 */
export function shopLocale(shop: { locale?: string | null; currency: string }): ShopLocale {
  if (shop.locale && isShopLocale(shop.locale)) return shop.locale;
  return BY_CURRENCY[shop.currency] ?? 'en-GB';
}

const cache = new Map<string, Intl.DateTimeFormat>();
function format(locale: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${locale}|${JSON.stringify(options)}`;
  let f = cache.get(key);
  if (!f) cache.set(key, (f = new Intl.DateTimeFormat(locale, options)));
  return f;
}

/** A calendar date ("2026-12-05") is a day, not an instant: it is read and written in UTC so no zone moves it. */
const isDay = (v: string) => /^\d{4}-\d{2}-\d{2}$/.test(v);
const instant = (v: string | Date) => (typeof v === 'string' ? new Date(isDay(v) ? `${v}T00:00:00Z` : v) : v);

export interface DateOptions {
  /** IANA zone of the reader; omitted: the runtime's own zone (the browser's, the server's). */
  timeZone?: string;
}

const DAY: Intl.DateTimeFormatOptions = { day: 'numeric', month: 'short', year: 'numeric' };
const TIME: Intl.DateTimeFormatOptions = { hour: 'numeric', minute: '2-digit' };

/** "5 Dec 2026" (en-GB), "Dec 5, 2026" (en-US). "—" for no date. */
export function formatDate(value: string | Date | null | undefined, locale: string, opts: DateOptions = {}): string {
  if (!value) return '—';
  const timeZone = typeof value === 'string' && isDay(value) ? 'UTC' : opts.timeZone;
  return format(locale, { ...DAY, timeZone }).format(instant(value));
}

/** A calendar day with its weekday: "Sat 5 Dec 2026" (en-GB), "Sat, Dec 5, 2026" (en-US). */
export function formatWeekday(value: string | Date | null | undefined, locale: string, opts: DateOptions = {}): string {
  if (!value) return '—';
  const timeZone = typeof value === 'string' && isDay(value) ? 'UTC' : opts.timeZone;
  return format(locale, { weekday: 'short', ...DAY, timeZone }).format(instant(value));
}

/** The dayjs display pattern of a date picker for the locale: the locale's order, month as a word. */
export function datePickerPattern(locale: string): string {
  const parts = format(locale, { weekday: 'short', ...DAY, timeZone: 'UTC' }).formatToParts(new Date(Date.UTC(2026, 11, 5)));
  const token: Partial<Record<Intl.DateTimeFormatPartTypes, string>> = { weekday: 'ddd', day: 'D', month: 'MMM', year: 'YYYY' };
  return parts.map((p) => (p.type === 'literal' ? p.value.replace(/[[\]]/g, '') : (token[p.type] ?? ''))).join('');
}

/** "5 Dec 2026, 14:05" (en-GB), "Dec 5, 2026, 2:05 PM" (en-US). */
export function formatDateTime(value: string | Date | null | undefined, locale: string, opts: DateOptions = {}): string {
  if (!value) return '—';
  return format(locale, { ...DAY, ...TIME, timeZone: opts.timeZone }).format(instant(value));
}

/** "14:05" (en-GB), "2:05 PM" (en-US). */
export function formatTime(value: string | Date | null | undefined, locale: string, opts: DateOptions = {}): string {
  if (!value) return '—';
  return format(locale, { ...TIME, timeZone: opts.timeZone }).format(instant(value));
}

/** "Dec 2026" style month and year, for charts. */
export function formatMonth(value: string | Date, locale: string, opts: DateOptions = {}): string {
  return format(locale, { month: 'short', year: 'numeric', timeZone: opts.timeZone }).format(instant(value));
}

/** The numeric pattern a date input shows for the locale, e.g. "DD/MM/YYYY" or "MM/DD/YYYY" (dayjs tokens). */
export function dateInputPattern(locale: string): string {
  const parts = format(locale, { day: '2-digit', month: '2-digit', year: 'numeric', timeZone: 'UTC' }).formatToParts(new Date(Date.UTC(2026, 11, 5)));
  const token: Partial<Record<Intl.DateTimeFormatPartTypes, string>> = { day: 'DD', month: 'MM', year: 'YYYY' };
  return parts.map((p) => (p.type === 'literal' ? p.value : (token[p.type] ?? ''))).join('');
}
