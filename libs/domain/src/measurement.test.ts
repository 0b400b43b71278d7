import { DomainInputError } from './errors';
import { assessMeasurement, type MeasurementInput } from './measurement';

const ctx = { drivetrainSpeeds: 11 };

describe('assessMeasurement dispatches every kind to its domain rule', () => {
  it.each<[MeasurementInput, string, string]>([
    // CHECKS.md B.1: 306.324 mm over 24 pitches = 0.5 % → replace on 11-speed.
    [{ kind: 'chain_elongation', method: 'ruler', pitches: 24, lengthValue: 306.324, lengthUnit: 'mm' }, 'worn', 'replace_chain'],
    [{ kind: 'chain_elongation', method: 'gauge', gaugePct: 0.75 }, 'worn', 'replace_chain'],
    [{ kind: 'wheel_centring', leftMm: 6, rightMm: 4 }, 'wearing', 'off_centre'],
    // 16 CFR 1512.11(b): below 1.6 mm.
    [{ kind: 'tyre_clearance', mm: 1.2 }, 'unsafe', 'below_minimum'],
    [{ kind: 'pad_thickness', mm: 0.8, minimumMm: 1, position: 'front' }, 'unsafe', 'below_minimum'],
    [{ kind: 'rotor_thickness', mm: 1.9, minimumMm: 1.5, position: 'rear' }, 'worn', 'replace'],
    // CHECKS.md B.5 [CP]: brake inner < 1.4 mm.
    [{ kind: 'cable_diameter', cable: 'brake', mm: 1.2 }, 'unsafe', 'too_thin_for_brake'],
    [{ kind: 'bearing_play', grade: 'slight', bearing: 'headset' }, 'wearing', 'adjust'],
    // ISO 4210-2 4.7.4: ≤ 5 mm.
    [{ kind: 'stem_gap', mm: 6 }, 'unsafe', 'too_large'],
  ])('%j → %s / %s', (input, condition, verdict) => {
    const result = assessMeasurement(input, ctx);
    expect(result.condition).toBe(condition);
    expect(result.verdict).toBe(verdict);
    expect(result.message.length).toBeGreaterThan(10);
    expect(Object.keys(result).sort()).toEqual(['condition', 'message', 'verdict']);
  });

  it('uses the drivetrain speed count and the shop policy for chains', () => {
    const input: MeasurementInput = { kind: 'chain_elongation', method: 'gauge', gaugePct: 0.5 };
    expect(assessMeasurement(input, { drivetrainSpeeds: 10 }).verdict).toBe('monitor');
    expect(assessMeasurement(input, { drivetrainSpeeds: 10, chainPolicy: { replaceAt10Pct: 0.5 } }).verdict).toBe('replace_chain');
  });

  it('passes input errors through', () => {
    expect(() => assessMeasurement({ kind: 'stem_gap', mm: -2 }, ctx)).toThrow(DomainInputError);
  });
});
