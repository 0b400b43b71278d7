import { chainWearLimits, type ChainLimitPolicy } from './chain-limits';
import { readChainElongation } from './chain-wear';
import { MEASUREMENT_KIND_LABELS, type MeasurementKind } from './inspection-areas';
import type { MeasurementInput } from './measurement';
import { roundTo } from './numeric';

/** One point of a repeated measurement, ready to plot across visits. */
export interface TrendValue {
  /** Series key: the kind, plus front/rear where a bike has two ("pad_thickness:front"). */
  readonly key: string;
  readonly kind: MeasurementKind;
  readonly label: string;
  readonly unit: '%' | 'mm';
  readonly value: number;
  /** The limit the verdict used, or null. */
  readonly limit: number | null;
}

const sided = (kind: MeasurementKind, position: string | undefined, unit: '%' | 'mm', value: number, limit: number | null): TrendValue => ({
  key: position ? `${kind}:${position}` : kind,
  kind,
  label: position ? `${MEASUREMENT_KIND_LABELS[kind]} (${position})` : MEASUREMENT_KIND_LABELS[kind],
  unit,
  value: roundTo(value, 4),
  limit,
});

/**
 * The plottable number of a measurement (chain elongation %, thickness in mm,
 * centring offset in mm, clearance in mm), or null for kinds without a
 * meaningful trend (graded bearing play, cable diameter, stem gap).
 */
export function trendValue(input: MeasurementInput, ctx: { drivetrainSpeeds: number; chainPolicy?: Partial<ChainLimitPolicy> }): TrendValue | null {
  switch (input.kind) {
    case 'chain_elongation': {
      const limit = chainWearLimits(ctx.drivetrainSpeeds, ctx.chainPolicy).replaceAtPct;
      return sided(input.kind, undefined, '%', readChainElongation(input).elongationPct, limit);
    }
    case 'pad_thickness':
    case 'rotor_thickness':
      return sided(input.kind, input.position, 'mm', input.mm, input.minimumMm);
    case 'wheel_centring':
      return sided(input.kind, input.position, 'mm', Math.abs(input.leftMm - input.rightMm) / 2, null);
    case 'tyre_clearance':
      return sided(input.kind, input.position, 'mm', input.mm, null);
    case 'cable_diameter':
    case 'bearing_play':
    case 'stem_gap':
      return null;
  }
}

export interface ChainTrendPoint {
  /** Days since any fixed epoch (e.g. Unix days). */
  readonly day: number;
  readonly pct: number;
}

export interface ChainDueEstimate {
  /** The day the trend reaches the limit (rounded up); the last reading's day when already there. */
  readonly dueDay: number;
  readonly alreadyDue: boolean;
  /** Least-squares slope of the current chain's readings, % per day. */
  readonly pctPerDay: number;
  readonly pointsUsed: number;
}

/** A reading this much below the one before means the chain was replaced: the trend restarts. */
const NEW_CHAIN_DROP_PCT = 0.05;

/**
 * When the current chain is likely to reach its replace-at limit, from a
 * straight line through its readings (ordinary least squares; common
 * practice, no source — chains do not wear exactly linearly, so this is an
 * estimate for planning, not a verdict). Only readings since the last drop
 * (a replaced chain) count. Null when fewer than two readings on different
 * days remain or the trend is not rising: then nothing honest can be said.
 */
export function chainDueEstimate(points: readonly ChainTrendPoint[], limitPct: number): ChainDueEstimate | null {
  const sorted = [...points].sort((a, b) => a.day - b.day);
  let start = 0;
  for (let i = 1; i < sorted.length; i++) if (sorted[i].pct < sorted[i - 1].pct - NEW_CHAIN_DROP_PCT) start = i;
  const seg = sorted.slice(start);
  const last = seg[seg.length - 1];
  if (!last) return null;
  if (last.pct >= limitPct) return { dueDay: last.day, alreadyDue: true, pctPerDay: slope(seg) ?? 0, pointsUsed: seg.length };
  const rate = slope(seg);
  if (rate === null || !rising(rate, seg)) return null;
  // Rounded before the ceiling: (0.5 − 0.3) / 0.001 is 200.00000000000006 in binary floating point, not 200.
  const daysLeft = Math.ceil(roundTo((limitPct - last.pct) / rate, 6));
  return { dueDay: last.day + daysLeft, alreadyDue: false, pctPerDay: rate, pointsUsed: seg.length };
}

/**
 * A slope that adds less than a millionth of a percent over the whole series is floating-point
 * noise of a flat series (three equal readings give ±1e-19 %/day, a due date tens of thousands of
 * years out), not wear: flat and falling trends have no due date.
 */
function rising(rate: number, seg: readonly ChainTrendPoint[]): boolean {
  const span = seg[seg.length - 1].day - seg[0].day;
  return rate > 0 && roundTo(rate * span, 6) > 0;
}

function slope(seg: readonly ChainTrendPoint[]): number | null {
  if (seg.length < 2) return null;
  const n = seg.length;
  const mx = seg.reduce((s, p) => s + p.day, 0) / n;
  const my = seg.reduce((s, p) => s + p.pct, 0) / n;
  const sxx = seg.reduce((s, p) => s + (p.day - mx) ** 2, 0);
  if (sxx === 0) return null;
  return seg.reduce((s, p) => s + (p.day - mx) * (p.pct - my), 0) / sxx;
}
