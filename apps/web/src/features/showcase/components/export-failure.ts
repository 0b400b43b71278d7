import type { ErrorCode } from '@benchproof/contracts';

/** Headings for the codes an export can stop with; the server's message (one per code) is the body. */
const TITLES: Partial<Record<ErrorCode | 'NETWORK', string>> = {
  CONSENT_REVOKED: 'An owner withdrew consent',
  NO_CONSENT: 'Not covered by the owner’s consent',
  SHOWCASE_DESK_OFF: 'The showcase is closed to the desk',
  NOT_FOUND: 'This export is gone',
  NETWORK: 'No connection',
};

/** How the library words a refused or failed export, looked up by the API's error code. */
export function exportFailure(code: ErrorCode | 'NETWORK' | null, message: string | null): { title: string; message: string } {
  return { title: (code && TITLES[code]) ?? 'The export failed', message: message ?? 'The export stopped. Try again.' };
}
