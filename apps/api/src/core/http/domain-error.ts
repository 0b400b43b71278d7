import { ERROR_CODES, type ErrorCode } from '@benchproof/contracts';

/** A failure the caller can act on; the error filter turns it into `{code, message, details}`. */
export class DomainError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string = ERROR_CODES[code].message,
    readonly details: unknown = null,
  ) {
    super(message);
  }

  get status(): number {
    return ERROR_CODES[this.code].status;
  }
}

/** The usual answer when a record is missing or belongs to another shop: the two look the same. */
export const notFound = (what: string): DomainError => new DomainError('NOT_FOUND', `${what} not found.`);
