import type { CountryCode } from 'libphonenumber-js';
import { DomainError } from '../core/http';

type PhoneLib = typeof import('libphonenumber-js/max');
let lib: PhoneLib | undefined;
/** Loaded with the first number read, not at boot: the full metadata is about 9 MB of resident memory (issue 22). */
// eslint-disable-next-line @typescript-eslint/no-require-imports -- lazy and synchronous on purpose, see above
const phoneLib = (): PhoneLib => (lib ??= require('libphonenumber-js/max') as PhoneLib);

/**
 * A phone number as typed, read with the shop's country for numbers without a country code, in
 * E.164 ('+61491570156'); null when it is not a valid number of any country (libphonenumber-js with
 * its full metadata, which checks the number ranges, not only the length).
 */
export function toE164(typed: string, country: string): string | null {
  const parsed = phoneLib().parsePhoneNumberFromString(typed, country as CountryCode);
  return parsed?.isValid() ? parsed.number : null;
}

/** The number to store for what desk typed: E.164, or PHONE_INVALID naming the field (the web puts it under the box). */
export function normalisePhone(typed: string | null, country: string): string | null {
  if (typed === null) return null;
  const e164 = toE164(typed, country);
  if (!e164) throw new DomainError('PHONE_INVALID', undefined, { field: 'phone', country });
  return e164;
}
