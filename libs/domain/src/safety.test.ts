import * as domain from './index';
import {
  BRAKE_CAUTION,
  CARBON_CAUTION,
  DECLINED_SAFETY_NOTICE,
  GENERAL_SAFETY,
  SCOPE_CAUTION,
  STEERING_CAUTION,
  TORQUE_CAUTION,
  WHEEL_CAUTION,
} from './safety';

describe('safety wording defers to the maker, local rules and a qualified mechanic (CHECKS.md D)', () => {
  it('the general footer names all three', () => {
    expect(GENERAL_SAFETY).toMatch(/maker's instructions/);
    expect(GENERAL_SAFETY).toMatch(/local regulations/);
    expect(GENERAL_SAFETY).toMatch(/qualified mechanic/);
    expect(GENERAL_SAFETY).toMatch(/not a guarantee/);
  });

  it('torque, brake, steering and carbon cautions name the maker', () => {
    for (const text of [TORQUE_CAUTION, BRAKE_CAUTION, STEERING_CAUTION, CARBON_CAUTION]) expect(text).toMatch(/maker/);
    expect(TORQUE_CAUTION).toMatch(/conversion for reference only/);
    expect(TORQUE_CAUTION).toMatch(/qualified mechanic/);
    expect(BRAKE_CAUTION).toMatch(/mineral oil and DOT fluid must never be mixed/);
    expect(WHEEL_CAUTION).toMatch(/lower maximum applies/);
    expect(SCOPE_CAUTION).toMatch(/does not prove/);
    expect(DECLINED_SAFETY_NOTICE).toMatch(/not to ride/);
  });

  it('never claims certification or compliance', () => {
    const texts = Object.values(domain).filter((v): v is string => typeof v === 'string');
    expect(texts.length).toBeGreaterThan(5);
    for (const t of texts) expect(t).not.toMatch(/certif|complies|compliant|meets ISO|meets EN/i);
  });

  it('offers no default torque table: ISO 4210-5 lab loads are not settings (CHECKS.md B.3, E)', () => {
    const names = Object.keys(domain);
    expect(names.filter((n) => /torque/i.test(n) && /default|table|preset|recommended/i.test(n) && n !== 'defaultTorqueTolerancePct')).toEqual([]);
    // The ISO 4210-5 torsional test loads (T1 60/80 N·m, T2 40/50 N·m) appear in no exported number table.
    const numericTables = Object.values(domain).filter(
      (v) => typeof v === 'object' && v !== null && !Array.isArray(v) && Object.values(v).every((x) => typeof x === 'number'),
    );
    for (const table of numericTables) {
      const values = Object.values(table as Record<string, number>);
      expect(values.some((x) => [60, 80, 40, 50].includes(x))).toBe(false);
    }
  });
});
