import { formatDate, formatMoney, shopLocale } from '@benchproof/domain';
import type { ReportSnapshot } from '../report-data';

/**
 * "2 Dec 2026" (or "Dec 2, 2026") from an ISO date or date-time, in the locale frozen with the
 * snapshot (an older snapshot without one: the locale of its currency). Days are read in UTC, as before.
 */
export const fmtDate = (iso: string | null, snap: Pick<ReportSnapshot, 'shop'>): string => formatDate(iso, shopLocale(snap.shop), { timeZone: 'UTC' });

/** "01:07.4" from milliseconds into a video. */
export function fmtTimecode(ms: number | null): string {
  if (ms === null) return '';
  const s = ms / 1000;
  const m = Math.floor(s / 60);
  return `${String(m).padStart(2, '0')}:${(s - m * 60).toFixed(1).padStart(4, '0')}`;
}

export const money = (minor: number, currency: string): string => formatMoney(minor, currency);
