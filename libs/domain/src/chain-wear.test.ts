import {
  PITCH_MM,
  chainElongationFromCaliper,
  chainElongationFromGauge,
  chainElongationFromRuler,
  elongationPct,
  nominalChainLengthMm,
  readChainElongation,
} from './chain-wear';
import { DomainInputError } from './errors';
import { MM_PER_INCH } from './units';

describe('chain pitch', () => {
  it('is 1/2 in = 12.7 mm exactly', () => {
    // NIST SP 811 (2008) App. B: 1 in = 25.4 mm exactly; ISO 9633 / ASME B29.1: 1/2 in pitch.
    expect(PITCH_MM).toBe(12.7);
    expect(PITCH_MM).toBe(0.5 * 25.4);
    expect(MM_PER_INCH).toBe(25.4);
  });
});

// CHECKS.md B.1 "Worked numbers [V]": nominal length and the lengths at 0.5 / 0.75 / 1.0 %.
const WORKED = [
  { n: 10, nominal: 127.0, at05: 127.635, at075: 127.953, at10: 128.27 },
  { n: 24, nominal: 304.8, at05: 306.324, at075: 307.086, at10: 307.848 },
  { n: 48, nominal: 609.6, at05: 612.648, at075: 614.172, at10: 615.696 },
];

describe('elongation % = (L − n·p) / (n·p) × 100 (CHECKS.md B.1, common practice)', () => {
  it.each(WORKED)('nominal length over $n pitches', ({ n, nominal }) => {
    // CHECKS.md B.1 worked numbers table [V].
    expect(nominalChainLengthMm(n)).toBeCloseTo(nominal, 9);
    expect(elongationPct(nominal, n)).toBe(0);
  });

  it.each(WORKED.filter((w) => w.n !== 10))('exact threshold lengths over $n pitches', ({ n, at05, at075, at10 }) => {
    // CHECKS.md B.1 worked numbers table [V]: these lengths are exact in decimal for 24 and 48 pitches.
    expect(elongationPct(at05, n)).toBe(0.5);
    expect(elongationPct(at075, n)).toBe(0.75);
    expect(elongationPct(at10, n)).toBe(1);
  });

  it('10-pitch table values are the thresholds rounded to 3 decimals of a mm', () => {
    // CHECKS.md B.1 worked numbers table [V]: 127.9525 is printed as 127.953.
    expect(elongationPct(127.635, 10)).toBe(0.5);
    expect(elongationPct(127.953, 10)).toBeCloseTo(0.75, 2);
    expect(elongationPct(128.27, 10)).toBe(1);
  });

  it('a roller-contact checker at 127.62 mm over 10 pitches reads 0.488 %', () => {
    // CHECKS.md B.1 [CP forum measurement]: 127.62 mm over 10 pitches ≈ 0.488 %.
    expect(elongationPct(127.62, 10)).toBeCloseTo(0.488, 3);
  });
});

describe('12-inch ruler rule of thumb (Sheldon Brown via pushbikes.org.uk, CHECKS.md B.1)', () => {
  // Arithmetic from CHECKS.md B.1 [V]: past-the-mark ÷ 12 in.
  it.each([
    { past: 1 / 32, pct: 0.2604 },
    { past: 1 / 16, pct: 0.5208 },
    { past: 3 / 32, pct: 0.7813 },
    { past: 1 / 8, pct: 1.0417 },
  ])('12 in + $past in over 24 pitches = $pct %', ({ past, pct }) => {
    const reading = chainElongationFromRuler(24, 12 + past, 'in');
    expect(reading.elongationPct).toBeCloseTo(pct, 4);
    expect(reading.method).toBe('ruler');
    expect(reading.pitches).toBe(24);
  });

  it('1/16 in over 12 in is 1.5875 mm and 1/8 in is 3.175 mm', () => {
    // CHECKS.md B.1 [V].
    expect(chainElongationFromRuler(24, 304.8 + 1.5875, 'mm').elongationPct).toBeCloseTo(0.5208, 4);
    expect(chainElongationFromRuler(24, 304.8 + 3.175, 'mm').elongationPct).toBeCloseTo(1.0417, 4);
  });

  it("one shop's variant, 1/8 in over 11 in (22 pitches), is 1.1364 %", () => {
    // CHECKS.md B.1 [V].
    expect(chainElongationFromRuler(22, 11 + 1 / 8, 'in').elongationPct).toBeCloseTo(1.1364, 4);
  });

  it('a ruler in inches and in millimetres give the same reading', () => {
    // NIST SP 811 App. B: 12.0625 in = 306.3875 mm exactly.
    expect(chainElongationFromRuler(24, 12.0625, 'in').elongationPct).toBe(chainElongationFromRuler(24, 306.3875, 'mm').elongationPct);
  });
});

describe('caliper method (industrial practice, CHECKS.md B.1, common practice, no source)', () => {
  it.each([7.75, 7.9, 8.5])('an unworn chain reads n·p whatever the roller diameter (%s mm)', (roller) => {
    // (L_inside + L_outside)/2 cancels the roller diameter.
    const n = 10;
    const reading = chainElongationFromCaliper(n, n * PITCH_MM - roller, n * PITCH_MM + roller, 'mm');
    expect(reading.measuredMm).toBeCloseTo(127, 9);
    expect(reading.elongationPct).toBe(0);
  });

  it('averages a worn pair to the worked 0.5 % length', () => {
    // CHECKS.md B.1 worked numbers: 306.324 mm over 24 pitches = 0.5 %.
    const reading = chainElongationFromCaliper(24, 306.324 - 7.75, 306.324 + 7.75, 'mm');
    expect(reading.elongationPct).toBe(0.5);
    expect(reading.method).toBe('caliper');
  });

  it('rejects an outside reading not larger than the inside one', () => {
    expect(() => chainElongationFromCaliper(24, 310, 300, 'mm')).toThrow(/outside reading/);
  });
});

describe('gauge reading', () => {
  it.each([0, 0.5, 0.75, 1])('records %s % as read, with the method', (pct) => {
    // CHECKS.md B.1 [CP]: go/no-go gauges mark 0.5 % and 0.75 % (some 1.0 %).
    const reading = chainElongationFromGauge(pct);
    expect(reading).toEqual({ method: 'gauge', pitches: null, measuredMm: null, elongationPct: pct });
  });

  it('rejects negative and absurd gauge readings', () => {
    expect(() => chainElongationFromGauge(-0.1)).toThrow(DomainInputError);
    expect(() => chainElongationFromGauge(6)).toThrow(DomainInputError);
  });
});

describe('input validation', () => {
  it.each([0, -1, 2.5, Number.NaN])('rejects %s pitches', (n) => {
    expect(() => nominalChainLengthMm(n)).toThrow(DomainInputError);
  });

  it('rejects zero, negative and non-finite lengths', () => {
    expect(() => chainElongationFromRuler(24, 0, 'mm')).toThrow(/greater than 0/);
    expect(() => chainElongationFromRuler(24, -300, 'mm')).toThrow(DomainInputError);
    expect(() => chainElongationFromRuler(24, Number.POSITIVE_INFINITY, 'mm')).toThrow(/finite/);
  });

  it('treats a reading more than 1 % short of nominal as a misread', () => {
    // 304.8 × 0.99 = 301.752 mm is exactly −1 %: still accepted; just below is rejected.
    expect(elongationPct(301.752, 24)).toBe(-1);
    try {
      elongationPct(301.7, 24);
      expect.unreachable('a short reading must throw');
    } catch (error) {
      expect(error).toBeInstanceOf(DomainInputError);
      expect((error as DomainInputError).code).toBe('MISREAD');
      expect((error as DomainInputError).message).toMatch(/shorter than 24 pitches/);
    }
  });

  it('treats a miscounted pitch (25 measured as 24) as a misread, not wear', () => {
    // 25 × 12.7 = 317.5 mm over a claimed 24 pitches would be +4.17 %; +5 % and more is rejected.
    expect(() => elongationPct(24 * 12.7 * 1.06, 24)).toThrow(/pin to pin/);
  });

  it('dispatches each measurement method', () => {
    expect(readChainElongation({ method: 'ruler', pitches: 24, lengthValue: 306.324, lengthUnit: 'mm' }).elongationPct).toBe(0.5);
    expect(readChainElongation({ method: 'caliper', pitches: 24, insideValue: 298.574, outsideValue: 314.074, lengthUnit: 'mm' }).elongationPct).toBe(0.5);
    expect(readChainElongation({ method: 'gauge', gaugePct: 0.75 }).elongationPct).toBe(0.75);
  });
});
