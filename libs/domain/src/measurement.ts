import { bearingPlayVerdict, type Bearing, type BearingPlayGrade } from './bearing-play';
import { chainWearVerdict, type ChainLimitPolicy } from './chain-limits';
import { readChainElongation, type ChainMeasurement } from './chain-wear';
import { cableDiameterCheck, stemGapCheck, thicknessVerdict, tyreClearanceVerdict, wheelCentringOffset } from './clearance';
import type { Condition } from './condition';
import type { WheelPosition } from './inspection-areas';

/** A typed reading as entered at the bench, one shape per measurement kind. */
export type MeasurementInput =
  | ({ kind: 'chain_elongation' } & ChainMeasurement)
  | { kind: 'wheel_centring'; leftMm: number; rightMm: number; position?: WheelPosition }
  | { kind: 'tyre_clearance'; mm: number; position?: WheelPosition }
  | { kind: 'pad_thickness'; mm: number; minimumMm: number; position: WheelPosition }
  | { kind: 'rotor_thickness'; mm: number; minimumMm: number; position: WheelPosition }
  | { kind: 'cable_diameter'; cable: 'brake' | 'shift'; mm: number }
  | { kind: 'bearing_play'; grade: BearingPlayGrade; bearing: Bearing; dialGaugeMm?: number | null }
  | { kind: 'stem_gap'; mm: number };

/** What the bike and the shop contribute to a verdict. */
export interface MeasurementContext {
  readonly drivetrainSpeeds: number;
  readonly chainPolicy?: Partial<ChainLimitPolicy>;
}

/** The computed part of a measurement, stored and shown beside the raw reading. */
export interface MeasurementResult {
  readonly condition: Condition;
  readonly verdict: string;
  readonly message: string;
}

const pick = (r: MeasurementResult): MeasurementResult => ({
  condition: r.condition,
  verdict: r.verdict,
  message: r.message,
});

/**
 * Computes the condition, verdict code and message of any measurement with
 * the matching domain function. Throws DomainInputError on impossible input.
 */
export function assessMeasurement(input: MeasurementInput, context: MeasurementContext): MeasurementResult {
  switch (input.kind) {
    case 'chain_elongation':
      return pick(chainWearVerdict(readChainElongation(input), context.drivetrainSpeeds, context.chainPolicy));
    case 'wheel_centring':
      return pick(wheelCentringOffset(input.leftMm, input.rightMm));
    case 'tyre_clearance':
      return pick(tyreClearanceVerdict(input.mm));
    case 'pad_thickness':
      return pick(thicknessVerdict(input.mm, input.minimumMm, { part: 'pad' }));
    case 'rotor_thickness':
      return pick(thicknessVerdict(input.mm, input.minimumMm, { part: 'rotor' }));
    case 'cable_diameter':
      return pick(cableDiameterCheck(input.cable, input.mm));
    case 'bearing_play':
      return pick(bearingPlayVerdict(input.grade, input.bearing, input.dialGaugeMm));
    case 'stem_gap':
      return pick(stemGapCheck(input.mm));
  }
}
