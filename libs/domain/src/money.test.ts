import { bignumber } from 'mathjs';
import { DomainInputError } from './errors';
import {
  currencyMinorDigits,
  estimateTotals,
  majorTextToMinor,
  minorToMajorText,
  formatMoney,
  labourMinor,
  lineTotalMinor,
  roundMinor,
  taxMinor,
} from './money';

/**
 * Oracle: exact decimal arithmetic with mathjs BigNumber (a decimal.js
 * Decimal), rounded with decimal.js ROUND_HALF_UP (= 4: halves away from
 * zero) — the same rule as roundMinor. Values below were also worked by hand.
 */
const ROUND_HALF_UP = 4;
const exactRound = (a: string, b: string): number => bignumber(a).times(bignumber(b)).toDecimalPlaces(0, ROUND_HALF_UP).toNumber();

describe('roundMinor: round half away from zero (half up for positive amounts)', () => {
  it.each([
    { n: 1592.5, d: 1, out: 1593 },
    { n: 1592.49, d: 1, out: 1592 },
    { n: 2.5, d: 1, out: 3 },
    { n: -2.5, d: 1, out: -3 },
    { n: 0.5, d: 1, out: 1 },
    { n: 0.4999, d: 1, out: 0 },
    { n: 31855, d: 20, out: 1593 }, // 1592.75
    { n: 5, d: 10, out: 1 }, // 0.5
    { n: 4, d: 10, out: 0 },
    { n: -15, d: 10, out: -2 }, // −1.5
    { n: 0, d: 7, out: 0 },
  ])('$n / $d → $out', ({ n, d, out }) => {
    // Worked by hand.
    expect(roundMinor(n, d)).toBe(out);
  });

  it('never returns negative zero', () => {
    expect(Object.is(roundMinor(-4, 10), 0)).toBe(true);
  });

  it('rejects a non-integer or zero denominator', () => {
    expect(() => roundMinor(1, 0)).toThrow(DomainInputError);
    expect(() => roundMinor(1, 1.5)).toThrow(DomainInputError);
  });
});

describe('labourMinor: hours × rate, rounded once', () => {
  it.each([
    { hours: 0.75, rate: 6000, out: 4500 }, // 45.00
    { hours: 0.1, rate: 4550, out: 455 },
    { hours: 1.25, rate: 4999, out: 6249 }, // 6248.75
    { hours: 0.35, rate: 5250, out: 1838 }, // 1837.5: a half, rounded up; naive float gives 1837
    { hours: 0.69, rate: 4550, out: 3140 }, // 3139.5; naive float gives 3139
    { hours: 1.15, rate: 5250, out: 6038 }, // 6037.5
    { hours: 0, rate: 4550, out: 0 },
  ])('$hours h × $rate → $out', ({ hours, rate, out }) => {
    // Hand-worked exact decimals; cross-checked with mathjs BigNumber.
    expect(labourMinor(hours, rate)).toBe(out);
    expect(labourMinor(hours, rate)).toBe(exactRound(String(hours), String(rate)));
  });

  it('rejects more than 4 decimals of hours, negative hours and fractional rates', () => {
    expect(() => labourMinor(0.33333, 4550)).toThrow(/at most 4 decimals/);
    expect(() => labourMinor(-1, 4550)).toThrow(DomainInputError);
    expect(() => labourMinor(1, 45.5)).toThrow(DomainInputError);
  });
});

describe('lineTotalMinor: qty × unit price', () => {
  it.each([
    { qty: 3, price: 1299, out: 3897 },
    { qty: 1.5, price: 899, out: 1349 }, // 1348.5
    { qty: 0.25, price: 1999, out: 500 }, // 499.75
    { qty: 2.5, price: 333, out: 833 }, // 832.5
  ])('$qty × $price → $out', ({ qty, price, out }) => {
    expect(lineTotalMinor(qty, price)).toBe(out);
    expect(lineTotalMinor(qty, price)).toBe(exactRound(String(qty), String(price)));
  });
});

describe('taxMinor: net × basis points / 10 000', () => {
  it.each([
    { net: 10000, bp: 2000, out: 2000 },
    { net: 1234, bp: 2000, out: 247 }, // 246.8
    { net: 1237, bp: 2000, out: 247 }, // 247.4
    { net: 12345, bp: 750, out: 926 }, // 925.875
    { net: 1010, bp: 1950, out: 197 }, // 196.95
    { net: 2, bp: 2500, out: 1 }, // 0.5
    { net: 5000, bp: 0, out: 0 },
  ])('$net at $bp bp → $out', ({ net, bp, out }) => {
    expect(taxMinor(net, bp)).toBe(out);
    expect(taxMinor(net, bp)).toBe(exactRound(String(net), String(bp / 10000)));
  });

  it('rejects a rate above 100 %', () => {
    expect(() => taxMinor(100, 10001)).toThrow(DomainInputError);
  });
});

describe('estimateTotals: lines rounded, tax once on the net total', () => {
  const lines = [
    { kind: 'part', qty: 2, unitPriceMinor: 1299 }, // 2598
    { kind: 'part', qty: 1.5, unitPriceMinor: 899 }, // 1348.5 → 1349
    { kind: 'labour', hours: 0.35, rateMinorPerHour: 5250 }, // 1837.5 → 1838
    { kind: 'labour', hours: 0.75, rateMinorPerHour: 4550 }, // 3412.5 → 3413
  ] as const;

  it('worked by hand at 20 %', () => {
    // parts 3947, labour 5251, net 9198, tax 1839.6 → 1840, gross 11038.
    expect(estimateTotals(lines, 2000)).toEqual({
      partsMinor: 3947,
      labourMinor: 5251,
      netMinor: 9198,
      taxMinor: 1840,
      grossMinor: 11038,
    });
  });

  it('differs from rounding tax per line, which is why tax is taken once', () => {
    // Per line: 519.6→520, 269.8→270, 367.6→368, 682.6→683 = 1841, one more than on the net.
    const perLine = [2598, 1349, 1838, 3413].reduce((sum, net) => sum + taxMinor(net, 2000), 0);
    expect(perLine).toBe(1841);
    expect(estimateTotals(lines, 2000).taxMinor).toBe(1840);
  });

  it('is all zeros for an empty estimate', () => {
    expect(estimateTotals([], 2000)).toEqual({ partsMinor: 0, labourMinor: 0, netMinor: 0, taxMinor: 0, grossMinor: 0 });
  });
});

describe('formatMoney with the currency minor digits (ISO 4217 via Intl)', () => {
  it.each([
    { minor: 12345, currency: 'GBP', locale: 'en-GB', out: '£123.45' },
    { minor: 5, currency: 'EUR', locale: 'en-GB', out: '€0.05' },
    { minor: 1234, currency: 'JPY', locale: 'en-US', out: '¥1,234' }, // 0 minor digits
    { minor: 1234, currency: 'KWD', locale: 'en-GB', out: 'KWD 1.234' }, // 3 minor digits
    { minor: 123450, currency: 'EUR', locale: 'de-DE', out: '1.234,50 €' },
  ])('$minor $currency in $locale → $out', ({ minor, currency, locale, out }) => {
    // Non-breaking spaces from Intl normalised for comparison.
    expect(formatMoney(minor, currency, locale).replace(/\s/g, ' ')).toBe(out);
  });

  it('knows the minor digits', () => {
    expect([currencyMinorDigits('GBP'), currencyMinorDigits('JPY'), currencyMinorDigits('KWD')]).toEqual([2, 0, 3]);
  });

  it('rejects fractional minor units and malformed currencies', () => {
    expect(() => formatMoney(12.5, 'GBP')).toThrow(DomainInputError);
    expect(() => formatMoney(100, 'POUNDS')).toThrow(DomainInputError);
  });
});

describe('prices typed in major units', () => {
  // ISO 4217 minor digits: GBP has 2, JPY has 0 (from memory; Intl.NumberFormat agrees).
  it.each([
    ['12.5', 'GBP', 1250],
    ['12,50', 'GBP', 1250],
    ['0.07', 'GBP', 7],
    ['.5', 'GBP', 50],
    ['1200', 'JPY', 1200],
  ])('reads %s %s as %i minor units', (text, currency, minor) => {
    expect(majorTextToMinor(text, currency)).toBe(minor);
  });

  it.each([
    ['12.345', 'GBP'],
    ['12.5', 'JPY'],
    ['', 'GBP'],
    ['.', 'GBP'],
    ['-3', 'GBP'],
    ['12a', 'GBP'],
  ])('refuses %s %s', (text, currency) => {
    expect(majorTextToMinor(text, currency)).toBeNull();
  });

  it('writes minor units back as the text a price box shows', () => {
    expect(minorToMajorText(1250, 'GBP')).toBe('12.50');
    expect(minorToMajorText(1200, 'JPY')).toBe('1200');
    expect(majorTextToMinor(minorToMajorText(8699, 'GBP'), 'GBP')).toBe(8699);
  });
});
