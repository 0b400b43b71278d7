import { formatMoney } from '@benchproof/domain';

const DATE = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });

/** "2 Dec 2026" from an ISO date or date-time. */
export const fmtDate = (iso: string | null): string => (iso ? DATE.format(new Date(iso.length === 10 ? `${iso}T00:00:00Z` : iso)) : '—');

/** "01:07.4" from milliseconds into a video. */
export function fmtTimecode(ms: number | null): string {
  if (ms === null) return '';
  const s = ms / 1000;
  const m = Math.floor(s / 60);
  return `${String(m).padStart(2, '0')}:${(s - m * 60).toFixed(1).padStart(4, '0')}`;
}

export const money = (minor: number, currency: string): string => formatMoney(minor, currency);
