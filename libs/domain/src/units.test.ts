import { unit } from 'mathjs';
import { DomainInputError } from './errors';
import { MM_PER_INCH, convertLength, fromMillimetres, toMillimetres } from './units';

describe('length units (NIST SP 811 (2008) App. B: 1 in = 25.4 mm exactly)', () => {
  it.each([
    { inches: 1, mm: 25.4 },
    { inches: 0.5, mm: 12.7 }, // chain pitch, CHECKS.md B.1
    { inches: 12, mm: 304.8 }, // 24 pitches, CHECKS.md B.1
    { inches: 1 / 16, mm: 1.5875 }, // CHECKS.md B.1
    { inches: 1 / 8, mm: 3.175 },
  ])('$inches in = $mm mm', ({ inches, mm }) => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(toMillimetres(inches, 'in')).toBeCloseTo(mm, 12);
    expect(fromMillimetres(mm, 'in')).toBeCloseTo(inches, 12);
    // mathjs as an independent oracle (CHECKS.md C).
    expect(toMillimetres(inches, 'in')).toBeCloseTo(unit(inches, 'inch').toNumber('mm'), 12);
  });

  it('is the identity for mm and round-trips', () => {
    expect(convertLength(306.324, 'mm', 'mm')).toBe(306.324);
    expect(convertLength(convertLength(7.3, 'mm', 'in'), 'in', 'mm')).toBeCloseTo(7.3, 12);
  });

  it('rejects non-finite input', () => {
    expect(() => toMillimetres(Number.NaN, 'in')).toThrow(DomainInputError);
  });
});
