import type { CountryCode } from 'libphonenumber-js';
import { parsePhoneNumberFromString } from 'libphonenumber-js/max';
import { DomainError } from '../core/http';

/**
 * A phone number as typed, read with the shop's country for numbers without a country code, in
 * E.164 ('+61491570156'); null when it is not a valid number of any country (libphonenumber-js with
 * its full metadata, which checks the number ranges, not only the length).
 */
export function toE164(typed: string, country: string): string | null {
  const parsed = parsePhoneNumberFromString(typed, country as CountryCode);
  return parsed?.isValid() ? parsed.number : null;
}

/** The number to store for what desk typed: E.164, or PHONE_INVALID naming the field (the web puts it under the box). */
export function normalisePhone(typed: string | null, country: string): string | null {
  if (typed === null) return null;
  const e164 = toE164(typed, country);
  if (!e164) throw new DomainError('PHONE_INVALID', undefined, { field: 'phone', country });
  return e164;
}
