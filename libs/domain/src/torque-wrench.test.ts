import {
  addMonthsToIsoDate,
  isWrenchCalibrationOverdue,
  latestCalendarDate,
  THREADLOCKERS,
  THREADLOCKER_LABELS,
  WRENCH_RECALIBRATION_MONTHS,
} from './torque-wrench';

// ISO 6789-1:2017 recalibration interval of 12 months — from memory (CHECKS.md B.4 [M]), to verify.
describe('wrench recalibration interval (ISO 6789-1:2017, from memory)', () => {
  it('is 12 months', () => {
    expect(WRENCH_RECALIBRATION_MONTHS).toBe(12);
  });

  it.each([
    ['2024-03-10', '2025-03-10', false, 'exactly 12 months is still in time'],
    ['2024-03-10', '2025-03-11', true, 'one day past 12 months'],
    ['2024-03-10', '2024-09-01', false, 'six months'],
    ['2024-02-29', '2025-02-28', false, 'leap day + 12 months = 28 Feb'],
    ['2024-02-29', '2025-03-01', true, 'a day after the clamped anniversary'],
    ['2022-01-01', '2025-01-01', true, 'three years'],
  ])('calibrated %s, checked %s → overdue %s (%s)', (calibratedOn, onDay, overdue) => {
    expect(isWrenchCalibrationOverdue(calibratedOn, onDay)).toBe(overdue);
  });

  it('has nothing to judge without a date', () => {
    expect(isWrenchCalibrationOverdue(null, '2025-01-01')).toBe(false);
    expect(isWrenchCalibrationOverdue(undefined, '2025-01-01')).toBe(false);
  });
});

describe('addMonthsToIsoDate', () => {
  it.each([
    ['2024-01-31', 1, '2024-02-29'],
    ['2023-01-31', 1, '2023-02-28'],
    ['2024-12-15', 1, '2025-01-15'],
    ['2024-05-20', 12, '2025-05-20'],
  ])('%s + %i months = %s', (iso, months, expected) => {
    expect(addMonthsToIsoDate(iso, months)).toBe(expected);
  });

  it('rejects a non-date', () => {
    expect(() => addMonthsToIsoDate('10/03/2024', 1)).toThrow(RangeError);
  });
});

describe('latestCalendarDate', () => {
  it('is the date at UTC+14', () => {
    expect(latestCalendarDate(new Date('2025-06-01T09:59:00Z'))).toBe('2025-06-01');
    expect(latestCalendarDate(new Date('2025-06-01T10:00:00Z'))).toBe('2025-06-02');
  });
});

describe('threadlocker kinds (ISO 4210-2 4.3.1 thread-locking compound, CHECKS.md B.3)', () => {
  it('labels every kind in plain words', () => {
    expect(THREADLOCKERS.map((t) => THREADLOCKER_LABELS[t].length > 3)).toEqual(THREADLOCKERS.map(() => true));
    expect(THREADLOCKER_LABELS.blue_medium).toMatch(/medium/i);
  });
});
