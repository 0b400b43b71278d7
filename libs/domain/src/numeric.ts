// Internal helpers shared by the computation modules. Not re-exported from
// index.ts: they are implementation detail, not part of the domain language.
import { DomainInputError } from './errors';

/** Throws unless `value` is a finite number. */
export function requireFinite(name: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new DomainInputError('NOT_A_NUMBER', `${name} must be a finite number.`, { field: name, value });
  }
  return value;
}

/** Throws unless `min <= value <= max` (bounds optional). */
export function requireInRange(name: string, value: number, range: { min?: number; max?: number; minExclusive?: boolean }): number {
  requireFinite(name, value);
  const { min, max, minExclusive = false } = range;
  const belowMin = min !== undefined && (minExclusive ? value <= min : value < min);
  const aboveMax = max !== undefined && value > max;
  if (belowMin || aboveMax) {
    const lower = min === undefined ? '' : `${minExclusive ? 'greater than' : 'at least'} ${min}`;
    const upper = max === undefined ? '' : `at most ${max}`;
    const rule = [lower, upper].filter(Boolean).join(' and ');
    throw new DomainInputError('OUT_OF_RANGE', `${name} must be ${rule} (got ${value}).`, {
      field: name,
      value,
      min,
      max,
    });
  }
  return value;
}

/** Throws unless `value` is an integer within the range. */
export function requireInteger(name: string, value: number, range: { min?: number; max?: number } = {}): number {
  requireFinite(name, value);
  if (!Number.isInteger(value)) {
    throw new DomainInputError('NOT_AN_INTEGER', `${name} must be a whole number (got ${value}).`, {
      field: name,
      value,
    });
  }
  return requireInRange(name, value, range);
}

/**
 * Rounds to a fixed number of decimals. Used so that a reading which is
 * exactly on a threshold in decimal (306.324 mm over 24 pitches = 0.5 %) is
 * not pushed just below it by binary floating point before it is compared.
 */
export function roundTo(value: number, decimals: number): number {
  const factor = 10 ** decimals;
  return Math.round(value * factor) / factor;
}

/** Formats a number for a message: fixed decimals, no trailing zeros beyond `min`. */
export function formatNumber(value: number, maxDecimals: number, minDecimals = 0): string {
  return value.toLocaleString('en-GB', {
    minimumFractionDigits: minDecimals,
    maximumFractionDigits: maxDecimals,
    useGrouping: false,
  });
}
