import { DomainInputError } from './errors';
import { requireInRange, requireInteger } from './numeric';

/*
 * All money is an integer count of the currency's minor unit (pence, cents).
 * Prices are entered net of tax; tax is added once, on the net total.
 */

/** Quantities and hours are exact to this many decimals (0.0001 h ≈ 0.36 s). */
const QUANTITY_DECIMALS = 4;
const QUANTITY_SCALE = 10 ** QUANTITY_DECIMALS;
/** Tax rates are basis points: 2000 bp = 20 %. */
const BASIS_POINTS = 10_000;

/**
 * THE rounding rule of BenchProof money: round half away from zero to a whole
 * minor unit (for the positive amounts of an estimate this is round half up:
 * 1592.5 → 1593). Computed in integers as numerator / denominator, so a
 * half is seen as a half and binary floating point cannot tip it
 * (0.35 h × 52.50 = 18.375 → 18.38 as on paper, where 0.35 * 5250 in floating
 * point is 1837.4999… and would round down). A non-integer numerator is
 * first taken at 6 decimals.
 */
export function roundMinor(numerator: number, denominator = 1): number {
  requireInteger('denominator', denominator, { min: 1 });
  let n = numerator;
  let d = denominator;
  if (!Number.isInteger(n)) {
    n = Math.round(requireInRange('amount', n, {}) * 1e6);
    d *= 1e6;
  }
  if (!Number.isSafeInteger(n) || !Number.isSafeInteger(d)) {
    throw new DomainInputError('OUT_OF_RANGE', 'Amount too large to compute exactly.', { numerator, denominator });
  }
  const sign = n < 0 ? -1 : 1;
  const abs = Math.abs(n);
  const whole = Math.floor(abs / d);
  const rest = abs - whole * d;
  const rounded = 2 * rest >= d ? whole + 1 : whole;
  return sign * rounded || 0;
}

/** A decimal quantity as an exact integer count of 1/10 000 units. */
function toScaled(name: string, value: number): number {
  requireInRange(name, value, { min: 0 });
  const scaled = Math.round(value * QUANTITY_SCALE);
  if (Math.abs(scaled - value * QUANTITY_SCALE) > 1e-6) {
    throw new DomainInputError('TOO_MANY_DECIMALS', `${name} may have at most ${QUANTITY_DECIMALS} decimals.`, {
      field: name,
      value,
    });
  }
  return scaled;
}

/** qty × unit price, rounded once by roundMinor. qty may be decimal (1.5 m of housing). */
export function lineTotalMinor(qty: number, unitPriceMinor: number): number {
  requireInteger('unit price', unitPriceMinor, { min: 0 });
  return roundMinor(toScaled('quantity', qty) * unitPriceMinor, QUANTITY_SCALE);
}

/** Labour: hours (decimal, e.g. 0.75) × hourly rate in minor units, rounded once by roundMinor. */
export function labourMinor(hours: number, rateMinorPerHour: number): number {
  requireInteger('labour rate', rateMinorPerHour, { min: 0 });
  return roundMinor(toScaled('hours', hours) * rateMinorPerHour, QUANTITY_SCALE);
}

/** Tax on a net amount at a rate in basis points (2000 = 20 %), rounded by roundMinor. */
export function taxMinor(netMinor: number, taxRateBasisPoints: number): number {
  requireInteger('net amount', netMinor);
  requireInteger('tax rate', taxRateBasisPoints, { min: 0, max: BASIS_POINTS });
  return roundMinor(netMinor * taxRateBasisPoints, BASIS_POINTS);
}

export type EstimateLine = { kind: 'part'; qty: number; unitPriceMinor: number } | { kind: 'labour'; hours: number; rateMinorPerHour: number };

export interface EstimateTotals {
  readonly partsMinor: number;
  readonly labourMinor: number;
  readonly netMinor: number;
  readonly taxMinor: number;
  readonly grossMinor: number;
}

/**
 * Totals of an estimate. Each line is rounded on its own (the figure printed
 * on it), lines are summed, and tax is computed ONCE on the net total, so the
 * printed lines always add up and tax is not rounded per line.
 */
export function estimateTotals(lines: readonly EstimateLine[], taxRateBp: number): EstimateTotals {
  let parts = 0;
  let labour = 0;
  for (const line of lines) {
    if (line.kind === 'part') parts += lineTotalMinor(line.qty, line.unitPriceMinor);
    else labour += labourMinor(line.hours, line.rateMinorPerHour);
  }
  const net = parts + labour;
  const tax = taxMinor(net, taxRateBp);
  return { partsMinor: parts, labourMinor: labour, netMinor: net, taxMinor: tax, grossMinor: net + tax };
}

function numberFormat(currency: string, locale: string): Intl.NumberFormat {
  try {
    return new Intl.NumberFormat(locale, { style: 'currency', currency });
  } catch {
    throw new DomainInputError('INVALID_FORMAT', `Unknown currency or locale: ${currency}, ${locale}.`, { currency, locale });
  }
}

/** Minor-unit digits of an ISO 4217 currency as Intl knows them (GBP 2, JPY 0, KWD 3). */
export function currencyMinorDigits(currency: string): number {
  return numberFormat(currency, 'en').resolvedOptions().maximumFractionDigits ?? 2;
}

/** Formats integer minor units for display, e.g. formatMoney(12345, 'GBP', 'en-GB') → "£123.45". */
export function formatMoney(minor: number, currency: string, locale = 'en-GB'): string {
  requireInteger('amount', minor);
  const format = numberFormat(currency, locale);
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(minor / 10 ** digits);
}

/**
 * A price typed in major units ("12.5", "12,50") → integer minor units, by string
 * arithmetic so no binary fraction creeps in. null when the text is not a price or
 * has more decimals than the currency has (ISO 4217 minor digits).
 */
export function majorTextToMinor(text: string, currency: string): number | null {
  const digits = currencyMinorDigits(currency);
  const clean = text.trim().replace(',', '.');
  const match = /^(\d{0,9})(?:\.(\d*))?$/.exec(clean);
  if (!match || clean === '' || clean === '.') return null;
  const [, whole = '', frac = ''] = match;
  if (frac.length > digits) return null;
  return Number(whole || '0') * 10 ** digits + Number((frac + '0'.repeat(digits)).slice(0, digits) || '0');
}

/** Integer minor units → the text a price box shows ("12.50"). */
export function minorToMajorText(minor: number, currency: string): string {
  const digits = currencyMinorDigits(currency);
  return (minor / 10 ** digits).toFixed(digits);
}
