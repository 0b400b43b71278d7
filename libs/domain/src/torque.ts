import { DomainInputError } from './errors';
import { formatNumber, requireInRange, roundTo } from './numeric';
import { CARBON_CAUTION, TORQUE_CAUTION } from './safety';

export const TORQUE_UNITS = ['nm', 'lbf_in', 'lbf_ft', 'kgf_cm'] as const;
export type TorqueUnit = (typeof TORQUE_UNITS)[number];

export const TORQUE_UNIT_LABELS: Readonly<Record<TorqueUnit, string>> = {
  nm: 'N·m',
  lbf_in: 'lbf·in',
  lbf_ft: 'lbf·ft',
  kgf_cm: 'kgf·cm',
};

/** Standard gravity g_n = 9.80665 m/s² exactly (3rd CGPM 1901; NIST SP 811 App. B). */
const STANDARD_GRAVITY = 9.80665;
/** Pound (avoirdupois) = 0.45359237 kg exactly (NIST SP 811 App. B). */
const POUND_KG = 0.45359237;
/** Pound-force = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N exactly (NIST SP 811 App. B). */
const POUND_FORCE_N = POUND_KG * STANDARD_GRAVITY;

/**
 * N·m per unit, derived from the exact definitions (NIST SP 811 (2008)
 * App. B.9, "moment of force or torque"): lbf·ft = lbf × 0.3048 m,
 * lbf·in = lbf × 0.0254 m, kgf·cm = 9.80665 N × 0.01 m.
 */
export const NEWTON_METRES_PER_UNIT: Readonly<Record<TorqueUnit, number>> = {
  nm: 1,
  lbf_in: POUND_FORCE_N * 0.0254,
  lbf_ft: POUND_FORCE_N * 0.3048,
  kgf_cm: STANDARD_GRAVITY * 0.01,
};

/** Converts a torque between units. Converted values are for reference only (TORQUE_CAUTION). */
export function convertTorque(value: number, from: TorqueUnit, to: TorqueUnit): number {
  requireInRange('torque', value, {});
  if (from === to) return value;
  return (value * NEWTON_METRES_PER_UNIT[from]) / NEWTON_METRES_PER_UNIT[to];
}

/** "5 N·m", "44.3 lbf·in": value rounded for display only, unit always shown. */
export function formatTorque(value: number, unit: TorqueUnit, maxDecimals = 2): string {
  return `${formatNumber(value, maxDecimals)} ${TORQUE_UNIT_LABELS[unit]}`;
}

/**
 * Default wrench tolerance for a single specified value: ±4 % at 10 N·m and
 * above, ±6 % below (ISO 6789-1:2017 permissible deviation for click-type
 * wrenches, from memory — verify before quoting to users).
 */
export function defaultTorqueTolerancePct(specifiedNm: number): number {
  return specifiedNm >= 10 ? 4 : 6;
}

export interface TorqueSpec {
  /** The maker's value, or the lower end of the maker's range. */
  readonly min: number;
  /** Upper end when the maker gives a range. */
  readonly max?: number | null;
  readonly unit: TorqueUnit;
}

export interface TorqueReading {
  readonly value: number;
  readonly unit: TorqueUnit;
}

export type TorqueVerdictCode = 'within' | 'under' | 'over';

export interface TorqueVerdict {
  readonly verdict: TorqueVerdictCode;
  readonly withinTolerance: boolean;
  /** Signed % from the spec (single value) or from the nearest end of the range (0 inside it). */
  readonly deviationPct: number;
  readonly appliedNm: number;
  readonly lowNm: number;
  readonly highNm: number;
  /** Wrench tolerance used; null for a range (the maker's range is the allowance). */
  readonly tolerancePct: number | null;
  readonly message: string;
  readonly cautions: readonly string[];
}

interface Band {
  lowNm: number;
  highNm: number;
  refNm: number;
  tolerancePct: number | null;
}

function bandFor(spec: TorqueSpec, tolerancePct: number | undefined): Band {
  const minNm = convertTorque(requireInRange('specified torque', spec.min, { min: 0, minExclusive: true }), spec.unit, 'nm');
  const hasRange = spec.max !== undefined && spec.max !== null && spec.max !== spec.min;
  if (hasRange) {
    const maxNm = convertTorque(requireInRange('specified maximum', spec.max ?? 0, { min: 0 }), spec.unit, 'nm');
    if (maxNm < minNm) {
      throw new DomainInputError('OUT_OF_RANGE', 'The specified maximum must not be below the minimum.', { ...spec });
    }
    return { lowNm: minNm, highNm: maxNm, refNm: minNm, tolerancePct: null };
  }
  const tol = requireInRange('tolerance', tolerancePct ?? defaultTorqueTolerancePct(minNm), { min: 0, max: 50 });
  return { lowNm: minNm * (1 - tol / 100), highNm: minNm * (1 + tol / 100), refNm: minNm, tolerancePct: tol };
}

function specText(spec: TorqueSpec, band: Band): string {
  const range = band.tolerancePct === null;
  const value = range ? `${formatNumber(spec.min, 2)}–${formatTorque(spec.max ?? spec.min, spec.unit)}` : formatTorque(spec.min, spec.unit);
  return range ? `the maker's range ${value}` : `the maker's ${value} (±${formatNumber(band.tolerancePct ?? 0, 1)} % wrench tolerance)`;
}

/**
 * Compares an applied torque with the maker's specification. A single value
 * passes within ± tolerancePct (default defaultTorqueTolerancePct); a range
 * passes from its minimum to its maximum inclusive, with no extra allowance,
 * because the maker's range already is one. Units may differ; the
 * comparison is in N·m. Never a default table: the spec always comes from
 * the maker (ISO 4210-5 lab test loads are not settings).
 */
export function torqueVerdict(input: { specified: TorqueSpec; applied: TorqueReading; tolerancePct?: number; carbonPart?: boolean }): TorqueVerdict {
  const band = bandFor(input.specified, input.tolerancePct);
  const appliedValue = requireInRange('applied torque', input.applied.value, { min: 0, minExclusive: true });
  const appliedNm = convertTorque(appliedValue, input.applied.unit, 'nm');
  // Rounded so that a value exactly on a band edge in decimal counts as on it.
  const a = roundTo(appliedNm, 9);
  const verdict: TorqueVerdictCode = a < roundTo(band.lowNm, 9) ? 'under' : a > roundTo(band.highNm, 9) ? 'over' : 'within';
  const nearest = band.tolerancePct !== null ? band.refNm : verdict === 'over' ? band.highNm : band.lowNm;
  const deviationPct = band.tolerancePct === null && verdict === 'within' ? 0 : roundTo(((appliedNm - nearest) / nearest) * 100, 6);
  const converted = input.applied.unit === 'nm' ? '' : ` (${formatTorque(appliedNm, 'nm')})`;
  const outcome = verdict === 'within' ? 'within specification' : `${verdict} by ${formatNumber(Math.abs(deviationPct), 1)} %`;
  const message = `Applied ${formatTorque(appliedValue, input.applied.unit)}${converted} against ${specText(input.specified, band)}: ${outcome}.`;
  return {
    verdict,
    withinTolerance: verdict === 'within',
    deviationPct,
    appliedNm,
    lowNm: band.lowNm,
    highNm: band.highNm,
    tolerancePct: band.tolerancePct,
    message,
    cautions: input.carbonPart ? [TORQUE_CAUTION, CARBON_CAUTION] : [TORQUE_CAUTION],
  };
}
