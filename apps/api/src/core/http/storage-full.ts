import { DomainError } from './domain-error';

/** A full disk as Node (ENOSPC, EDQUOT over quota) and SQLite (SQLITE_FULL) report it. */
const FULL_CODES = new Set(['ENOSPC', 'EDQUOT', 'SQLITE_FULL']);

/** Whether an error, or one it wraps (Drizzle wraps SQLite's as `cause`), says the disk is full. */
export function isStorageFull(err: unknown): boolean {
  let cur: unknown = err;
  for (let depth = 0; cur && typeof cur === 'object' && depth < 5; depth++) {
    const code = (cur as { code?: unknown }).code;
    if (typeof code === 'string' && FULL_CODES.has(code)) return true;
    cur = (cur as { cause?: unknown }).cause;
  }
  return false;
}

/**
 * The DomainError an unexpected failure becomes where a code must be chosen outside the
 * error filter (tus hooks): STORAGE_FULL for a full disk (uploads or database), else INTERNAL.
 */
export function domainErrorOf(err: unknown): DomainError {
  if (err instanceof DomainError) return err;
  return new DomainError(isStorageFull(err) ? 'STORAGE_FULL' : 'INTERNAL');
}
