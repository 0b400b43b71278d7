/**
 * The one error pattern of libs/domain: a function given input it cannot
 * compute with throws a DomainInputError. It extends RangeError, so callers
 * that only know the standard library still see a sensible error, and it
 * carries a machine-readable `code` plus `details` so the api can map it to a
 * `VALIDATION_FAILED` response and the web can show the message as is.
 *
 * Results that are valid but bad news (a worn chain, a torque outside the
 * spec) are never errors: they come back as a verdict.
 */
export type DomainInputErrorCode = 'NOT_A_NUMBER' | 'OUT_OF_RANGE' | 'NOT_AN_INTEGER' | 'TOO_MANY_DECIMALS' | 'MISREAD' | 'INVALID_FORMAT';

export class DomainInputError extends RangeError {
  readonly code: DomainInputErrorCode;
  readonly details: Readonly<Record<string, unknown>>;

  constructor(code: DomainInputErrorCode, message: string, details: Record<string, unknown> = {}) {
    super(message);
    this.name = 'DomainInputError';
    this.code = code;
    this.details = details;
  }
}

/** True when `error` is a DomainInputError (also across module copies). */
export function isDomainInputError(error: unknown): error is DomainInputError {
  return error instanceof Error && error.name === 'DomainInputError' && 'code' in error;
}
