import { currencyMinorDigits, formatMoney } from '@benchproof/domain';

/**
 * "12.5" typed in major units → 1250 minor units, by string arithmetic so
 * no binary fraction creeps in. null when the text is not a price.
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

/** Minor units → the text a price box shows ("12.50"). */
export function minorToMajorText(minor: number, currency: string): string {
  const digits = currencyMinorDigits(currency);
  return (minor / 10 ** digits).toFixed(digits);
}

export const money = (minor: number, currency: string) => formatMoney(minor, currency);
