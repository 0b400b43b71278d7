/*
 * The wrench behind a torque entry and the fastener's locking, as the
 * torque log records them (CHECKS.md A.4 torque log, B.3 4.3.1, B.4).
 */

/**
 * Months after which a hand torque wrench is due for recalibration.
 * ISO 6789-1:2017 — recalibrate after about 5000 cycles or 12 months, whichever
 * comes first. Quoted from memory (CHECKS.md B.4 marks it [M]); verify before citing.
 */
export const WRENCH_RECALIBRATION_MONTHS = 12;

export const WRENCH_CALIBRATION_NOTICE = 'Wrench calibration older than 12 months';

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

function parseDay(iso: string): { y: number; m: number; d: number } | null {
  const match = ISO_DATE.exec(iso);
  if (!match) return null;
  return { y: Number(match[1]), m: Number(match[2]), d: Number(match[3]) };
}

/** `iso` plus whole months, clamped to the month's last day (29 Feb + 12 months = 28 Feb). */
export function addMonthsToIsoDate(iso: string, months: number): string {
  const p = parseDay(iso);
  if (!p) throw new RangeError(`Not an ISO date: ${iso}`);
  const monthIndex = p.m - 1 + months;
  const y = p.y + Math.floor(monthIndex / 12);
  const m = ((monthIndex % 12) + 12) % 12;
  const lastDay = new Date(Date.UTC(y, m + 1, 0)).getUTCDate();
  const d = Math.min(p.d, lastDay);
  return `${String(y).padStart(4, '0')}-${String(m + 1).padStart(2, '0')}-${String(d).padStart(2, '0')}`;
}

/**
 * True when the wrench was last calibrated more than
 * {@link WRENCH_RECALIBRATION_MONTHS} before `onDay` (both ISO dates, YYYY-MM-DD).
 * Exactly 12 months to the day is still in time. No date recorded → false
 * (nothing to judge; the log shows that no date was given).
 */
export function isWrenchCalibrationOverdue(calibratedOn: string | null | undefined, onDay: string): boolean {
  if (!calibratedOn) return false;
  return addMonthsToIsoDate(calibratedOn, WRENCH_RECALIBRATION_MONTHS) < onDay;
}

/**
 * The latest calendar date anywhere on Earth at `now` (UTC+14), so that a
 * mechanic far east of the server can enter "today" without it counting as
 * a future date.
 */
export function latestCalendarDate(now: Date): string {
  return new Date(now.getTime() + 14 * 60 * 60 * 1000).toISOString().slice(0, 10);
}

/** Thread-locking compound on a fastener (ISO 4210-2 4.3.1 names it among locking devices; CHECKS.md B.3). */
export const THREADLOCKERS = ['none', 'blue_medium', 'red_high', 'pre_applied', 'other'] as const;
export type Threadlocker = (typeof THREADLOCKERS)[number];

export const THREADLOCKER_LABELS: Readonly<Record<Threadlocker, string>> = {
  none: 'None',
  blue_medium: 'Medium strength (blue, removable by hand tools)',
  red_high: 'High strength (red, may need heat to undo)',
  pre_applied: 'Pre-applied on the bolt by the maker',
  other: 'Other compound',
};
