import {
  dateInputPattern,
  datePickerPattern,
  formatDate,
  formatDateTime,
  formatMonth,
  formatTime,
  formatWeekday,
  SHOP_LOCALE_LABELS,
  SHOP_LOCALES,
  shopLocale,
} from '@benchproof/domain';
import { createContext, useContext, useMemo, type ReactNode } from 'react';

/** Until the shop's settings arrive: day-first, the more common order (domain shopLocale's fallback). */
const FALLBACK = 'en-GB';
const LocaleContext = createContext<string>(FALLBACK);

/** Every date below is written in the shop's locale (ShopSettingsDto.dateLocale, or the owner page's shop). */
export function DatesLocale({ locale, children }: { locale: string | null | undefined; children: ReactNode }) {
  return <LocaleContext.Provider value={locale ?? FALLBACK}>{children}</LocaleContext.Provider>;
}

export interface Dates {
  locale: string;
  /** "5 Dec 2026" / "Dec 5, 2026"; a calendar day ("2026-12-05") stays that day. */
  date: (v: string | Date | null | undefined) => string;
  /** "5 Dec 2026, 14:05" / "Dec 5, 2026, 2:05 PM", in the reader's zone. */
  dateTime: (v: string | Date | null | undefined) => string;
  time: (v: string | Date | null | undefined) => string;
  /** "Sat, 5 Dec 2026" / "Sat, Dec 5, 2026": a promised day. */
  weekday: (v: string | Date | null | undefined) => string;
  month: (v: string | Date) => string;
  /** The dayjs pattern date inputs show ("DD/MM/YYYY", "MM/DD/YYYY"). */
  inputFormat: string;
  /** The dayjs pattern date pickers display ("ddd, D MMM YYYY" / "ddd, MMM D, YYYY"). */
  pickerFormat: string;
  /** The same with the time, on the locale's clock ("HH:mm" or "h:mm A"). */
  pickerTimeFormat: string;
  /** Sunday (0) in the US and Canada, else Monday (1), for date pickers. */
  firstDayOfWeek: 0 | 1;
}

/** The one date formatter of the web (libs/domain dates), bound to the shop's locale. */
export function useDates(): Dates {
  const locale = useContext(LocaleContext);
  return useMemo(
    () => ({
      locale,
      date: (v) => formatDate(v, locale),
      dateTime: (v) => formatDateTime(v, locale),
      time: (v) => formatTime(v, locale),
      weekday: (v) => formatWeekday(v, locale),
      month: (v) => formatMonth(v, locale),
      inputFormat: dateInputPattern(locale),
      pickerFormat: datePickerPattern(locale),
      pickerTimeFormat: `${datePickerPattern(locale)} ${/[AP]M/i.test(formatTime('2026-12-05T14:05:00Z', locale, { timeZone: 'UTC' })) ? 'h:mm A' : 'HH:mm'}`,
      firstDayOfWeek: locale === 'en-US' || locale === 'en-CA' ? 0 : 1,
    }),
    [locale],
  );
}

/** The value of the locale choice that follows the currency (stored as null). */
export const LOCALE_FROM_CURRENCY = 'auto';

/** The choices of "Dates written as" (setup and shop settings): from the currency, or one locale with a sample date. */
export function localeChoices(currency: string): { value: string; label: string }[] {
  return [
    { value: LOCALE_FROM_CURRENCY, label: `From the currency: ${SHOP_LOCALE_LABELS[shopLocale({ currency })]}` },
    ...SHOP_LOCALES.map((l) => ({ value: l, label: `${SHOP_LOCALE_LABELS[l]} — ${formatDate('2026-12-05', l)}` })),
  ];
}
