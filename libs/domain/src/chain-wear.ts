import { DomainInputError } from './errors';
import { formatNumber, requireInRange, requireInteger, roundTo } from './numeric';
import { MM_PER_INCH, toMillimetres, type LengthUnit } from './units';

/**
 * Bicycle chain pitch: 1/2 in = 12.7 mm exactly. Sources: ISO 9633:2001 /
 * ASME B29.1 (½-in pitch), NIST SP 811 App. B (1 in = 25.4 mm exactly).
 */
export const PITCH_MM = 0.5 * MM_PER_INCH;

export const CHAIN_WEAR_METHODS = ['ruler', 'caliper', 'gauge'] as const;
export type ChainWearMethod = (typeof CHAIN_WEAR_METHODS)[number];

/**
 * A chain reading as taken at the bench. Pitches are pin-to-pin intervals
 * (a full link, inner plus outer, is 2 pitches).
 */
export type ChainMeasurement =
  | { method: 'ruler'; pitches: number; lengthValue: number; lengthUnit: LengthUnit }
  | { method: 'caliper'; pitches: number; insideValue: number; outsideValue: number; lengthUnit: LengthUnit }
  | { method: 'gauge'; gaugePct: number };

/** Elongation with the method it came from, ready for a verdict. */
export interface ChainReading {
  readonly method: ChainWearMethod;
  readonly pitches: number | null;
  readonly measuredMm: number | null;
  /** Rounded to 1e-6 % so decimal readings on a threshold compare as on paper. */
  readonly elongationPct: number;
}

/** Readings shorter than nominal by more than this are a misread (brief rule). */
const MAX_SHORTFALL_PCT = 1;
/**
 * Readings longer than this are a miscounted pitch, not wear: bicycle chains
 * are replaced long before 2 % (common practice, no source). One pitch
 * miscounted over 24 already gives +4.2 %.
 */
const MAX_PLAUSIBLE_PCT = 5;
const MAX_PITCHES = 240;

/** Nominal length of `pitches` pitches in mm (n × 12.7). */
export function nominalChainLengthMm(pitches: number): number {
  requireInteger('pitches', pitches, { min: 1, max: MAX_PITCHES });
  return pitches * PITCH_MM;
}

/**
 * Elongation % = (L_measured − n·p) / (n·p) × 100 (CHECKS.md B.1, common
 * practice; the same formula as industrial chain length validation).
 * Throws DomainInputError MISREAD when the reading cannot be a real chain.
 */
export function elongationPct(measuredMm: number, pitches: number): number {
  const nominal = nominalChainLengthMm(pitches);
  requireInRange('measured length', measuredMm, { min: 0, minExclusive: true });
  const pct = roundTo(((measuredMm - nominal) / nominal) * 100, 6);
  if (pct < -MAX_SHORTFALL_PCT) {
    throw new DomainInputError(
      'MISREAD',
      `The reading is more than ${MAX_SHORTFALL_PCT} % shorter than ${pitches} pitches (${formatNumber(nominal, 3)} mm): check the pitch count and the reading.`,
      { measuredMm, pitches, elongationPct: pct },
    );
  }
  if (pct > MAX_PLAUSIBLE_PCT) {
    throw new DomainInputError(
      'MISREAD',
      `The reading is more than ${MAX_PLAUSIBLE_PCT} % longer than ${pitches} pitches: count pitches pin to pin (a full link is 2 pitches) and measure again.`,
      { measuredMm, pitches, elongationPct: pct },
    );
  }
  return pct;
}

/** Ruler or tape over `pitches` pitches, pin centre to pin centre. */
export function chainElongationFromRuler(pitches: number, lengthValue: number, unit: LengthUnit): ChainReading {
  const measuredMm = toMillimetres(lengthValue, unit);
  return { method: 'ruler', pitches, measuredMm, elongationPct: elongationPct(measuredMm, pitches) };
}

/**
 * Caliper across the rollers: the average of the inside and outside
 * readings over the same pitches cancels the roller diameter (industrial
 * practice, CHECKS.md B.1, common practice, no source).
 */
export function chainElongationFromCaliper(pitches: number, insideValue: number, outsideValue: number, unit: LengthUnit): ChainReading {
  const inside = toMillimetres(insideValue, unit);
  const outside = toMillimetres(outsideValue, unit);
  requireInRange('inside reading', inside, { min: 0, minExclusive: true });
  if (outside <= inside) {
    throw new DomainInputError('MISREAD', 'The outside reading must be larger than the inside reading.', {
      insideValue,
      outsideValue,
    });
  }
  const measuredMm = (inside + outside) / 2;
  return { method: 'caliper', pitches, measuredMm, elongationPct: elongationPct(measuredMm, pitches) };
}

/**
 * A wear gauge reads elongation directly: a go/no-go gauge as the mark that
 * dropped in (0.5, 0.75 or 1.0; 0 when none did), a dial checker as read.
 */
export function chainElongationFromGauge(gaugePct: number): ChainReading {
  requireInRange('gauge reading', gaugePct, { min: 0, max: MAX_PLAUSIBLE_PCT });
  return { method: 'gauge', pitches: null, measuredMm: null, elongationPct: roundTo(gaugePct, 6) };
}

/** Turns a bench measurement into a reading, whatever the method. */
export function readChainElongation(m: ChainMeasurement): ChainReading {
  switch (m.method) {
    case 'ruler':
      return chainElongationFromRuler(m.pitches, m.lengthValue, m.lengthUnit);
    case 'caliper':
      return chainElongationFromCaliper(m.pitches, m.insideValue, m.outsideValue, m.lengthUnit);
    case 'gauge':
      return chainElongationFromGauge(m.gaugePct);
  }
}
