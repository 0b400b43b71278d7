import { retryDelayMs } from './retry';

// Values worked by hand from base × 2^(attempt−1) (common practice, no source).
describe('retryDelayMs', () => {
  it.each([
    [1, 30_000, 30_000],
    [2, 30_000, 60_000],
    [3, 30_000, 120_000],
    [7, 30_000, 1_920_000],
    [8, 30_000, 3_600_000],
    [20, 30_000, 3_600_000],
  ])('retry %i with base %i waits %i ms', (attempt, base, expected) => {
    expect(retryDelayMs(attempt, base)).toBe(expected);
  });

  it('refuses attempt 0', () => {
    expect(() => retryDelayMs(0, 1000)).toThrow(RangeError);
  });
});
