import {
  MAX_STEM_GAP_MM,
  MIN_TYRE_CLEARANCE_MM,
  cableDiameterCheck,
  dishOffsetFromGauge,
  stemGapCheck,
  thicknessVerdict,
  tyreClearanceVerdict,
  wheelCentringOffset,
} from './clearance';
import { DomainInputError } from './errors';

describe('wheelCentringOffset: offset = (left − right)/2 (half the gap difference)', () => {
  // Thresholds 0.5 mm / 2 mm: BenchProof policy, common practice, no source.
  it.each([
    { left: 5, right: 5, offset: 0, towards: 'centred', condition: 'sound' },
    { left: 5.5, right: 4.5, offset: 0.5, towards: 'centred', condition: 'sound' },
    { left: 6, right: 4, offset: 1, towards: 'right', condition: 'wearing' },
    { left: 3, right: 7, offset: -2, towards: 'left', condition: 'wearing' },
    { left: 9, right: 3, offset: 3, towards: 'right', condition: 'worn' },
  ])('left $left, right $right → $offset mm $towards', ({ left, right, offset, towards, condition }) => {
    const r = wheelCentringOffset(left, right);
    expect(r.offsetMm).toBe(offset);
    expect(r.towards).toBe(towards);
    expect(r.condition).toBe(condition);
  });

  it('says which side and how far', () => {
    expect(wheelCentringOffset(3, 7).message).toMatch(/^Wheel 2 mm towards the left/);
  });

  it('rejects negative gaps', () => {
    expect(() => wheelCentringOffset(-1, 4)).toThrow(DomainInputError);
  });
});

describe('dishOffsetFromGauge (Park Tool Repair Help, "Wheel Dishing (Centering)")', () => {
  it.each([
    { gap: 3, offset: 1.5 }, // the worked example in CHECKS.md B.10
    { gap: 0, offset: 0 },
    { gap: 1.2, offset: 0.6 },
  ])('gap $gap mm → rim $offset mm off centre', ({ gap, offset }) => {
    expect(dishOffsetFromGauge(gap)).toBeCloseTo(offset, 12);
  });

  it('rejects a negative gap', () => {
    expect(() => dishOffsetFromGauge(-0.5)).toThrow(DomainInputError);
  });
});

describe('tyreClearanceVerdict (minimum 1.6 mm, 16 CFR 1512.11(b))', () => {
  it('defaults to 1.6 mm = 1/16 in', () => {
    // 16 CFR 1512.11(b): at least 1.6 mm (1/16 in).
    expect(MIN_TYRE_CLEARANCE_MM).toBe(1.6);
    expect(MIN_TYRE_CLEARANCE_MM).toBeCloseTo(25.4 / 16, 1);
  });

  it.each([
    { mm: 0, verdict: 'below_minimum', condition: 'unsafe' },
    { mm: 1.59, verdict: 'below_minimum', condition: 'unsafe' },
    { mm: 1.6, verdict: 'tight', condition: 'wearing' }, // "at least 1.6 mm": on the minimum passes
    { mm: 2.59, verdict: 'tight', condition: 'wearing' },
    { mm: 2.6, verdict: 'ok', condition: 'sound' }, // 1 mm margin: common practice, no source
    { mm: 8, verdict: 'ok', condition: 'sound' },
  ])('$mm mm → $verdict', ({ mm, verdict, condition }) => {
    const r = tyreClearanceVerdict(mm);
    expect(r.verdict).toBe(verdict);
    expect(r.condition).toBe(condition);
  });

  it('takes another minimum', () => {
    expect(tyreClearanceVerdict(2.5, 3).verdict).toBe('below_minimum');
  });
});

describe('thicknessVerdict (below the maker minimum: do not ride, CHECKS.md D)', () => {
  // 0.5 mm warning margin: common practice, no source. Minimum comes from the maker's marking per part.
  it.each([
    { measured: 1.2, min: 1.5, verdict: 'below_minimum', condition: 'unsafe' },
    { measured: 1.5, min: 1.5, verdict: 'replace', condition: 'worn' },
    { measured: 2.0, min: 1.5, verdict: 'replace', condition: 'worn' },
    { measured: 2.01, min: 1.5, verdict: 'ok', condition: 'sound' },
    { measured: 0.4, min: 0.5, verdict: 'below_minimum', condition: 'unsafe' },
    { measured: 3, min: 0.5, verdict: 'ok', condition: 'sound' },
  ])('$measured mm against $min mm → $verdict', ({ measured, min, verdict, condition }) => {
    const r = thicknessVerdict(measured, min, { part: 'rotor' });
    expect(r.verdict).toBe(verdict);
    expect(r.condition).toBe(condition);
  });

  // CHECKS.md D (brakes): "Do not ride if pads are worn to the maker's wear line or rotors are
  // below the minimum thickness marked on them." A pad AT its line is unsafe; a rotor at its minimum is worn.
  it.each([
    { part: 'pad', measured: 0.5, min: 0.5, condition: 'unsafe', text: 'worn to the wear line. Unsafe — do not ride; replace.' },
    { part: 'pad', measured: 0.499_999_9, min: 0.5, condition: 'unsafe', text: 'worn to the wear line. Unsafe — do not ride; replace.' },
    { part: 'pad', measured: 0.4, min: 0.5, condition: 'unsafe', text: 'below the minimum. Unsafe — do not ride; replace.' },
    { part: 'pad', measured: 0.6, min: 0.5, condition: 'worn', text: 'at or near the minimum. Replace.' },
    { part: 'rotor', measured: 1.5, min: 1.5, condition: 'worn', text: 'at or near the minimum. Replace.' },
    { part: 'rotor', measured: 1.4, min: 1.5, condition: 'unsafe', text: 'below the minimum. Unsafe — do not ride; replace.' },
  ] as const)('$part $measured mm against its line $min mm → $condition', ({ part, measured, min, condition, text }) => {
    const r = thicknessVerdict(measured, min, { part });
    expect(r.condition).toBe(condition);
    expect(r.message.endsWith(text)).toBe(true);
  });

  it('honours a custom margin and says do not ride below the minimum', () => {
    expect(thicknessVerdict(1.2, 1, { warnMarginMm: 0.1 }).verdict).toBe('ok');
    expect(thicknessVerdict(0.8, 1).message).toBe("Pad 0.8 mm against the maker's minimum 1 mm: below the minimum. Unsafe — do not ride; replace.");
  });

  it('rejects a zero minimum and negative readings', () => {
    expect(() => thicknessVerdict(1, 0)).toThrow(DomainInputError);
    expect(() => thicknessVerdict(-1, 1)).toThrow(DomainInputError);
  });
});

describe('cableDiameterCheck (CHECKS.md B.5, common practice, no source)', () => {
  it.each([
    { kind: 'brake', mm: 1.1, verdict: 'too_thin_for_brake', condition: 'unsafe' },
    { kind: 'brake', mm: 1.39, verdict: 'too_thin_for_brake', condition: 'unsafe' },
    { kind: 'brake', mm: 1.4, verdict: 'check', condition: 'wearing' },
    { kind: 'brake', mm: 1.5, verdict: 'ok', condition: 'sound' },
    { kind: 'brake', mm: 1.6, verdict: 'ok', condition: 'sound' },
    { kind: 'brake', mm: 1.8, verdict: 'ok', condition: 'sound' }, // BMX / some mechanical disc up to ~1.8
    { kind: 'shift', mm: 1.1, verdict: 'ok', condition: 'sound' },
    { kind: 'shift', mm: 1.2, verdict: 'ok', condition: 'sound' },
    { kind: 'shift', mm: 1.5, verdict: 'check', condition: 'wearing' },
  ] as const)('$kind $mm mm → $verdict', ({ kind, mm, verdict, condition }) => {
    const r = cableDiameterCheck(kind, mm);
    expect(r.verdict).toBe(verdict);
    expect(r.condition).toBe(condition);
  });

  it('rejects absurd diameters', () => {
    expect(() => cableDiameterCheck('brake', 0)).toThrow(DomainInputError);
    expect(() => cableDiameterCheck('shift', 6)).toThrow(DomainInputError);
  });
});

describe('stemGapCheck (≤ 5 mm, ISO 4210-2 4.7.4 as in the 2014/2015 text)', () => {
  it.each([
    { gap: 0, verdict: 'ok' },
    { gap: 3, verdict: 'ok' },
    { gap: 5, verdict: 'ok' },
    { gap: 5.01, verdict: 'too_large' },
    { gap: 12, verdict: 'too_large' },
  ])('$gap mm → $verdict', ({ gap, verdict }) => {
    expect(MAX_STEM_GAP_MM).toBe(5);
    const r = stemGapCheck(gap);
    expect(r.verdict).toBe(verdict);
    expect(r.condition).toBe(verdict === 'ok' ? 'sound' : 'unsafe');
  });

  it("defers to the maker's instructions when flagged", () => {
    expect(stemGapCheck(8).message).toContain("maker's instructions govern");
  });

  it('rejects a negative gap', () => {
    expect(() => stemGapCheck(-1)).toThrow(DomainInputError);
  });
});
