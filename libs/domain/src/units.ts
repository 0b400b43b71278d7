import { requireFinite } from './numeric';

/** Length units a workshop tool reads in. */
export const LENGTH_UNITS = ['mm', 'in'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

export const LENGTH_UNIT_LABELS: Readonly<Record<LengthUnit, string>> = { mm: 'mm', in: 'in' };

/**
 * Millimetres per inch. Source: NIST SP 811 (2008) App. B — the inch is
 * 2.54 × 10⁻² m exactly.
 */
export const MM_PER_INCH = 25.4;

/** Converts a length in `unit` to millimetres (1 in = 25.4 mm exactly, NIST SP 811). */
export function toMillimetres(value: number, unit: LengthUnit): number {
  requireFinite('length', value);
  return unit === 'mm' ? value : value * MM_PER_INCH;
}

/** Converts millimetres to `unit` (1 in = 25.4 mm exactly, NIST SP 811). */
export function fromMillimetres(mm: number, unit: LengthUnit): number {
  requireFinite('length', mm);
  return unit === 'mm' ? mm : mm / MM_PER_INCH;
}

/** Converts a length between two units. */
export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  return fromMillimetres(toMillimetres(value, from), to);
}
