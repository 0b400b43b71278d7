/** Thrown by a handler when retrying cannot help (a refused recipient, a deleted record): the task fails at once. */
export class PermanentTaskError extends Error {}

/**
 * Error codes of failures that pass by themselves: a full disk or database (space comes back),
 * a lost or refused connection, a timeout. Node's system error codes, SQLite's result codes
 * (SQLITE_FULL, SQLITE_BUSY) and nodemailer's connection codes (ECONNECTION, ETIMEDOUT, ESOCKET).
 */
const TRANSIENT_CODES = new Set([
  'ENOSPC',
  'EDQUOT',
  'SQLITE_FULL',
  'SQLITE_BUSY',
  'ECONNREFUSED',
  'ECONNRESET',
  'ECONNECTION',
  'ETIMEDOUT',
  'ESOCKET',
  'EPIPE',
  'EAI_AGAIN',
  'ENOTFOUND',
  'EHOSTUNREACH',
  'ENETUNREACH',
]);

/** True when the error (or one it wraps as `cause`) carries a transient code: worth trying again much later. */
export function isTransientError(err: unknown, depth = 0): boolean {
  if (!err || typeof err !== 'object' || depth > 3 || err instanceof PermanentTaskError) return false;
  const { code, cause } = err as { code?: unknown; cause?: unknown };
  if (typeof code === 'string' && TRANSIENT_CODES.has(code)) return true;
  return isTransientError(cause, depth + 1);
}
