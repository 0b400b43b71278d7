import { DomainInputError } from './errors';
import { formatJobNumber, parseJobNumber } from './job-number';

describe('job numbers', () => {
  it.each([
    { year: 2026, seq: 42, out: 'J-2026-0042' },
    { year: 2026, seq: 1, out: 'J-2026-0001' },
    { year: 2027, seq: 9999, out: 'J-2027-9999' },
    { year: 2027, seq: 12345, out: 'J-2027-12345' },
  ])('$year / $seq → $out and back', ({ year, seq, out }) => {
    expect(formatJobNumber(year, seq)).toBe(out);
    expect(parseJobNumber(out)).toEqual({ year, seq });
  });

  it('reads lower case and surrounding spaces', () => {
    expect(parseJobNumber(' j-2026-0042 ')).toEqual({ year: 2026, seq: 42 });
  });

  it.each(['J-2026-42', 'J-2026-00042', 'J-2026-0000', 'X-2026-0042', '2026-0042', ''])('rejects %j', (value) => {
    expect(() => parseJobNumber(value)).toThrow(DomainInputError);
  });

  it('rejects a zero or fractional sequence and odd years', () => {
    expect(() => formatJobNumber(2026, 0)).toThrow(DomainInputError);
    expect(() => formatJobNumber(2026, 1.5)).toThrow(DomainInputError);
    expect(() => formatJobNumber(1999, 1)).toThrow(DomainInputError);
  });
});
