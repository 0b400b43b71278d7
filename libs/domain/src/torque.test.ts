import { unit } from 'mathjs';
import { DomainInputError } from './errors';
import { CARBON_CAUTION, TORQUE_CAUTION } from './safety';
import { NEWTON_METRES_PER_UNIT, TORQUE_UNITS, TORQUE_UNIT_LABELS, convertTorque, defaultTorqueTolerancePct, formatTorque, torqueVerdict } from './torque';

/** Relative closeness; CHECKS.md B.2: never assert exact equality of converted floats. */
function expectRelClose(actual: number, expected: number, rel = 1e-12): void {
  expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThanOrEqual(rel);
}

describe('torque factors (NIST SP 811 (2008) App. B.9, exact derivations in CHECKS.md B.2)', () => {
  it('lbf·ft = 0.45359237 kg × 9.80665 m/s² × 0.3048 m = 1.3558179483314004 N·m', () => {
    // The CHECKS.md B.2 value has one digit more than a double holds; parsed to the nearest double.
    expectRelClose(NEWTON_METRES_PER_UNIT.lbf_ft, Number('1.3558179483314004'));
    // SP 811 printed factor 1.355 818 E+00 (7 significant figures).
    expect(NEWTON_METRES_PER_UNIT.lbf_ft).toBeCloseTo(1.355818, 6);
  });

  it('lbf·in = 0.1129848290276167 N·m = lbf·ft / 12', () => {
    expectRelClose(NEWTON_METRES_PER_UNIT.lbf_in, 0.1129848290276167);
    expectRelClose(NEWTON_METRES_PER_UNIT.lbf_in * 12, NEWTON_METRES_PER_UNIT.lbf_ft);
    // SP 811 printed factor 1.129 848 E−01.
    expect(NEWTON_METRES_PER_UNIT.lbf_in).toBeCloseTo(0.1129848, 7);
  });

  it('kgf·cm = 0.0980665 N·m exactly (g_n = 9.806 65 m/s², 3rd CGPM 1901)', () => {
    expectRelClose(NEWTON_METRES_PER_UNIT.kgf_cm, 0.0980665);
  });

  it('reciprocals (CHECKS.md B.2)', () => {
    expectRelClose(convertTorque(1, 'nm', 'lbf_ft'), 0.7375621492772654);
    expectRelClose(convertTorque(1, 'nm', 'lbf_in'), 8.850745791327185);
    expectRelClose(convertTorque(1, 'nm', 'kgf_cm'), 10.197162129779283);
  });

  it('agrees with mathjs as an independent oracle (CHECKS.md C: mathjs 15.2.0 reproduces the exact values)', () => {
    expectRelClose(convertTorque(1, 'lbf_ft', 'nm'), unit(1, 'lbf ft').toNumber('N m'));
    expectRelClose(convertTorque(1, 'lbf_in', 'nm'), unit(1, 'lbf in').toNumber('N m'));
    expectRelClose(convertTorque(1, 'kgf_cm', 'nm'), unit(1, 'kgf cm').toNumber('N m'));
    expectRelClose(convertTorque(40, 'nm', 'lbf_in'), unit(40, 'N m').toNumber('lbf in'));
  });
});

describe('workshop values (CHECKS.md B.2 table [V])', () => {
  it.each([
    { nm: 4, lbfIn: 35.4, lbfFt: 2.95, kgfCm: 40.79 },
    { nm: 5, lbfIn: 44.25, lbfFt: 3.688, kgfCm: 50.99 },
    { nm: 6, lbfIn: 53.1, lbfFt: 4.425, kgfCm: 61.18 },
    { nm: 12, lbfIn: 106.21, lbfFt: 8.851, kgfCm: 122.37 },
    { nm: 40, lbfIn: 354.03, lbfFt: 29.502, kgfCm: 407.89 },
  ])('$nm N·m', ({ nm, lbfIn, lbfFt, kgfCm }) => {
    expect(convertTorque(nm, 'nm', 'lbf_in')).toBeCloseTo(lbfIn, 2);
    expect(convertTorque(nm, 'nm', 'lbf_ft')).toBeCloseTo(lbfFt, 3);
    expect(convertTorque(nm, 'nm', 'kgf_cm')).toBeCloseTo(kgfCm, 2);
    expectRelClose(convertTorque(nm, 'nm', 'lbf_in'), unit(nm, 'N m').toNumber('lbf in'));
  });

  it('round trips within 1e-12 relative for every pair of units (CHECKS.md B.2)', () => {
    for (const from of TORQUE_UNITS) {
      for (const to of TORQUE_UNITS) {
        for (const value of [0.5, 5, 12.4, 55]) {
          expectRelClose(convertTorque(convertTorque(value, from, to), to, from), value);
        }
      }
    }
  });

  it('labels every unit and never as energy', () => {
    expect(Object.values(TORQUE_UNIT_LABELS)).toEqual(['N·m', 'lbf·in', 'lbf·ft', 'kgf·cm']);
    expect(Object.values(TORQUE_UNIT_LABELS).join(' ')).not.toMatch(/J|joule/i);
    expect(formatTorque(44.2537, 'lbf_in')).toBe('44.25 lbf·in');
  });
});

describe('torqueVerdict', () => {
  it('default tolerance is ±4 % from 10 N·m, ±6 % below (ISO 6789-1:2017, from memory)', () => {
    expect(defaultTorqueTolerancePct(10)).toBe(4);
    expect(defaultTorqueTolerancePct(9.99)).toBe(6);
  });

  it.each([
    // Single value 5 N·m, ±6 %: band 4.7–5.3 N·m, edges inclusive.
    { applied: 5, verdict: 'within', deviation: 0 },
    { applied: 5.3, verdict: 'within', deviation: 6 },
    { applied: 4.7, verdict: 'within', deviation: -6 },
    { applied: 5.31, verdict: 'over', deviation: 6.2 },
    { applied: 4.69, verdict: 'under', deviation: -6.2 },
  ])('5 N·m spec, $applied applied → $verdict', ({ applied, verdict, deviation }) => {
    const r = torqueVerdict({ specified: { min: 5, unit: 'nm' }, applied: { value: applied, unit: 'nm' } });
    expect(r.verdict).toBe(verdict);
    expect(r.withinTolerance).toBe(verdict === 'within');
    expect(r.deviationPct).toBeCloseTo(deviation, 6);
    expect(r.tolerancePct).toBe(6);
  });

  it('a range passes from min to max inclusive, with no extra allowance', () => {
    const spec = { min: 5, max: 7, unit: 'nm' as const };
    expect(torqueVerdict({ specified: spec, applied: { value: 7, unit: 'nm' } }).verdict).toBe('within');
    expect(torqueVerdict({ specified: spec, applied: { value: 6, unit: 'nm' } }).deviationPct).toBe(0);
    const over = torqueVerdict({ specified: spec, applied: { value: 7.14, unit: 'nm' } });
    expect(over.verdict).toBe('over');
    expect(over.deviationPct).toBeCloseTo(2, 6);
    const under = torqueVerdict({ specified: spec, applied: { value: 4.5, unit: 'nm' } });
    expect(under.verdict).toBe('under');
    expect(under.deviationPct).toBeCloseTo(-10, 6);
    expect(under.tolerancePct).toBeNull();
  });

  it('compares across units: 40 lbf·in applied to a 5 N·m spec is 4.52 N·m, under', () => {
    // 40 × 0.1129848290276167 = 4.519393 N·m (NIST SP 811 App. B.9 factor).
    const r = torqueVerdict({ specified: { min: 5, unit: 'nm' }, applied: { value: 40, unit: 'lbf_in' } });
    expect(r.appliedNm).toBeCloseTo(4.519393, 6);
    expect(r.verdict).toBe('under');
    expect(r.message).toBe("Applied 40 lbf·in (4.52 N·m) against the maker's 5 N·m (±6 % wrench tolerance): under by 9.6 %.");
  });

  it('uses ±4 % from 10 N·m and a given tolerance when supplied', () => {
    const spec = { min: 40, unit: 'nm' as const };
    expect(torqueVerdict({ specified: spec, applied: { value: 41.6, unit: 'nm' } }).verdict).toBe('within');
    expect(torqueVerdict({ specified: spec, applied: { value: 41.7, unit: 'nm' } }).verdict).toBe('over');
    expect(torqueVerdict({ specified: spec, applied: { value: 41.7, unit: 'nm' }, tolerancePct: 5 }).verdict).toBe('within');
  });

  it('always carries the torque caution, plus the carbon caution on carbon parts (CHECKS.md B.4, D)', () => {
    const base = { specified: { min: 5, unit: 'nm' as const }, applied: { value: 5, unit: 'nm' as const } };
    expect(torqueVerdict(base).cautions).toEqual([TORQUE_CAUTION]);
    expect(torqueVerdict({ ...base, carbonPart: true }).cautions).toEqual([TORQUE_CAUTION, CARBON_CAUTION]);
  });

  it('rejects negative or zero torque and an inverted range', () => {
    expect(() => torqueVerdict({ specified: { min: -5, unit: 'nm' }, applied: { value: 5, unit: 'nm' } })).toThrow(DomainInputError);
    expect(() => torqueVerdict({ specified: { min: 5, unit: 'nm' }, applied: { value: 0, unit: 'nm' } })).toThrow(DomainInputError);
    expect(() => torqueVerdict({ specified: { min: 7, max: 5, unit: 'nm' }, applied: { value: 6, unit: 'nm' } })).toThrow(/maximum/);
  });
});
