import type { MeasurementInputDto, ShopSettingsDto } from '@benchproof/contracts';
import { assessMeasurement, isDomainInputError, measurementCautions, trendValue, type MeasurementContext } from '@benchproof/domain';
import { DomainError } from '../core/http';
import type { StoredMeasurementResult } from '../db/schema';

/** The result as stored (typed on the measurements table's JSON column). */
export type StoredResult = StoredMeasurementResult;

/** The drivetrain speed count and the shop's chain-limit overrides: what a verdict depends on besides the reading. */
export function measurementContext(drivetrainSpeeds: number, settings: Pick<ShopSettingsDto, 'chainLimits'>): MeasurementContext {
  return { drivetrainSpeeds, chainPolicy: settings.chainLimits ?? undefined };
}

/** Runs libs/domain on a reading; impossible input becomes VALIDATION_FAILED with the domain's message. */
export function assess(input: MeasurementInputDto, ctx: MeasurementContext): StoredResult {
  try {
    const r = assessMeasurement(input, ctx);
    return { condition: r.condition, verdict: r.verdict, message: r.message, cautions: measurementCautions(input), trend: trendValue(input, ctx) };
  } catch (e) {
    if (isDomainInputError(e)) throw new DomainError('VALIDATION_FAILED', e.message, { domainCode: e.code, ...e.details });
    throw e;
  }
}

/** The unit the reading was taken in, as the mechanic read it. */
export function unitOf(input: MeasurementInputDto): string {
  if (input.kind === 'chain_elongation') return input.method === 'gauge' ? 'gauge_pct' : input.lengthUnit;
  if (input.kind === 'bearing_play') return 'grade';
  return 'mm';
}
