import type { Condition } from './condition';
import { formatNumber, requireInRange, roundTo } from './numeric';

/** Result of a bench check: a condition on BenchProof's scale, a verdict code, a message naming method and source. */
export interface CheckResult<V extends string> {
  readonly condition: Condition;
  readonly verdict: V;
  readonly message: string;
}

const mm = (value: number, decimals = 2): string => `${formatNumber(value, decimals)} mm`;

export interface WheelCentringResult extends CheckResult<'centred' | 'off_centre' | 'well_off_centre'> {
  /** Positive: the rim sits towards the right; (left − right) / 2. */
  readonly offsetMm: number;
  readonly towards: 'left' | 'right' | 'centred';
}

/**
 * Centring of a wheel in the frame or fork from the gaps between rim (or
 * tyre) and the left and right stays/blades. The rim sits (left − right)/2
 * off centre, towards the side with the smaller gap. Limits are our policy
 * (common practice, no source): within 0.5 mm reads centred and sound, up to
 * 2 mm wearing (re-seat or re-dish), beyond that worn.
 */
export function wheelCentringOffset(
  leftMm: number,
  rightMm: number,
  limits: { centredWithinMm?: number; attentionAboveMm?: number } = {},
): WheelCentringResult {
  requireInRange('left gap', leftMm, { min: 0, max: 100 });
  requireInRange('right gap', rightMm, { min: 0, max: 100 });
  const { centredWithinMm = 0.5, attentionAboveMm = 2 } = limits;
  const offsetMm = roundTo((leftMm - rightMm) / 2, 6);
  const size = Math.abs(offsetMm);
  const towards = size <= centredWithinMm ? 'centred' : offsetMm > 0 ? 'right' : 'left';
  if (towards === 'centred') {
    return { offsetMm, towards, condition: 'sound', verdict: 'centred', message: `Wheel centred (${mm(size)} off, within ${mm(centredWithinMm)}).` };
  }
  const far = size > attentionAboveMm;
  return {
    offsetMm,
    towards,
    condition: far ? 'worn' : 'wearing',
    verdict: far ? 'well_off_centre' : 'off_centre',
    message: `Wheel ${mm(size)} towards the ${towards} (half the gap difference). Check the axle is seated in the dropouts, then the dish.`,
  };
}

/**
 * Rim offset from centre measured with a dishing gauge: half the gap at the
 * indicator (Park Tool Repair Help, "Wheel Dishing (Centering)"; reference
 * the locknut faces, not the axle ends).
 */
export function dishOffsetFromGauge(gapMm: number): number {
  requireInRange('dishing gauge gap', gapMm, { min: 0, max: 50 });
  return gapMm / 2;
}

/** Minimum tyre-to-frame/fork clearance: 1.6 mm (1/16 in), 16 CFR 1512.11(b). */
export const MIN_TYRE_CLEARANCE_MM = 1.6;

/**
 * Tyre clearance. Below the minimum (default 1.6 mm, 16 CFR 1512.11(b)) is
 * unsafe: a tyre that can touch the frame can lock or wear through. AT the
 * minimum passes (the rule says "at least"). Less than `warnMarginMm`
 * (default 1 mm, common practice, no source) above it reads wearing: check
 * with the wheel flexed and mud in mind.
 */
export function tyreClearanceVerdict(clearanceMm: number, minMm = MIN_TYRE_CLEARANCE_MM, warnMarginMm = 1): CheckResult<'ok' | 'tight' | 'below_minimum'> {
  requireInRange('tyre clearance', clearanceMm, { min: 0, max: 100 });
  const value = roundTo(clearanceMm, 6);
  const rule = `minimum ${mm(minMm)}`;
  if (value < minMm) {
    return { condition: 'unsafe', verdict: 'below_minimum', message: `Tyre clearance ${mm(value)}, below the ${rule}. Do not ride until fixed.` };
  }
  if (value < roundTo(minMm + warnMarginMm, 6)) {
    return { condition: 'wearing', verdict: 'tight', message: `Tyre clearance ${mm(value)}, close to the ${rule}.` };
  }
  return { condition: 'sound', verdict: 'ok', message: `Tyre clearance ${mm(value)} (${rule}).` };
}

/**
 * Pad or rotor thickness against the maker's minimum (pad wear line,
 * rotor "MIN TH" marking). CHECKS.md D: "Do not ride if pads are worn to the
 * maker's wear line or rotors are below the minimum thickness marked on them",
 * so a pad at or under its line and a rotor under its minimum are unsafe; up to
 * `warnMarginMm` above that (default 0.5 mm, common practice, no source) is
 * worn — replace; above that sound. The maker's minimum is entered per part.
 */
export function thicknessVerdict(
  measuredMm: number,
  minimumMm: number,
  options: { warnMarginMm?: number; part?: 'pad' | 'rotor' } = {},
): CheckResult<'ok' | 'replace' | 'below_minimum'> {
  const { warnMarginMm = 0.5, part = 'pad' } = options;
  requireInRange('measured thickness', measuredMm, { min: 0, max: 20 });
  requireInRange("maker's minimum thickness", minimumMm, { min: 0, minExclusive: true, max: 20 });
  requireInRange('warning margin', warnMarginMm, { min: 0, max: 10 });
  const value = roundTo(measuredMm, 6);
  const what = `${part === 'pad' ? 'Pad' : 'Rotor'} ${mm(value)} against the maker's minimum ${mm(minimumMm)}`;
  if (part === 'pad' && value <= minimumMm) {
    const where = value === minimumMm ? 'worn to the wear line' : 'below the minimum';
    return { condition: 'unsafe', verdict: 'below_minimum', message: `${what}: ${where}. Unsafe — do not ride; replace.` };
  }
  if (value < minimumMm) {
    return { condition: 'unsafe', verdict: 'below_minimum', message: `${what}: below the minimum. Unsafe — do not ride; replace.` };
  }
  if (value <= roundTo(minimumMm + warnMarginMm, 6)) {
    return { condition: 'worn', verdict: 'replace', message: `${what}: at or near the minimum. Replace.` };
  }
  return { condition: 'sound', verdict: 'ok', message: `${what}.` };
}

/** Typical inner cable diameters (CHECKS.md B.5, common practice, no source). */
export const CABLE_DIAMETERS_MM = {
  brake: { typicalMin: 1.5, typicalMax: 1.8, warnBelow: 1.4 },
  shift: { typicalMin: 1.1, typicalMax: 1.3 },
} as const;

/**
 * Inner cable diameter. A brake inner under 1.4 mm is most likely a shift
 * inner fitted to a brake: unsafe (CHECKS.md B.5, common practice, no
 * source). Outside the typical range otherwise: check the part.
 */
export function cableDiameterCheck(kind: 'brake' | 'shift', diameterMm: number): CheckResult<'ok' | 'check' | 'too_thin_for_brake'> {
  requireInRange('cable diameter', diameterMm, { min: 0, minExclusive: true, max: 5 });
  const t = CABLE_DIAMETERS_MM[kind];
  const value = roundTo(diameterMm, 6);
  const typical = `typical ${kind} inner ${formatNumber(t.typicalMin, 1)}–${mm(t.typicalMax, 1)}`;
  const warnBelow = CABLE_DIAMETERS_MM.brake.warnBelow;
  if (kind === 'brake' && value < warnBelow) {
    return {
      condition: 'unsafe',
      verdict: 'too_thin_for_brake',
      message: `Brake inner ${mm(value)} is under ${mm(warnBelow, 1)}: likely a shift cable. Fit a brake inner before riding.`,
    };
  }
  if (value < t.typicalMin || value > t.typicalMax) {
    return { condition: 'wearing', verdict: 'check', message: `Inner ${mm(value)} is outside the ${typical}: check the part.` };
  }
  return { condition: 'sound', verdict: 'ok', message: `Inner ${mm(value)} (${typical}).` };
}

/** Maximum stem-top to steerer-top gap: 5 mm, ISO 4210-2 4.7.4 (2014/2015 text). */
export const MAX_STEM_GAP_MM = 5;

/**
 * Gap from the top of the stem down to the top of the steerer. Above 5 mm
 * (ISO 4210-2 4.7.4) the stem clamps too little steerer: unsafe. 0 means
 * flush. The stem and steerer maker's instructions govern, above all on
 * carbon steerers.
 */
export function stemGapCheck(gapMm: number, maxMm = MAX_STEM_GAP_MM): CheckResult<'ok' | 'too_large'> {
  requireInRange('stem gap', gapMm, { min: 0, max: 100 });
  const value = roundTo(gapMm, 6);
  const rule = `at most ${mm(maxMm, 1)}`;
  if (value > maxMm) {
    return {
      condition: 'unsafe',
      verdict: 'too_large',
      message: `Steerer top ${mm(value)} below the stem top (${rule}). Do not ride; the stem and steerer maker's instructions govern.`,
    };
  }
  return { condition: 'sound', verdict: 'ok', message: `Steerer top ${mm(value)} below the stem top (${rule}).` };
}
