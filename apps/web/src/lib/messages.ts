import { ApiError } from './api-client';

// Wording shared by forms and notices, without zod, so a notice on a first screen does not pull the form checks in.

/** What the web says when evidence is frozen at hand-over (409 JOB_CLOSED). */
export const JOB_CLOSED_MESSAGE = 'This job was handed over; its records are frozen. A manager can still correct them — every change is recorded.';

/** Codes whose wording on a form differs from the server's default message; null = shown under the boxes instead. */
const FORM_MESSAGES: Partial<Record<ApiError['code'], string | null>> = {
  VALIDATION_FAILED: null,
  PHONE_INVALID: null,
  JOB_CLOSED: JOB_CLOSED_MESSAGE,
};

/** The message for a failed save, looked up by error code; field problems give null (they sit under the boxes). */
export function formFailure(error: unknown): string | null {
  if (!error) return null;
  if (!(error instanceof ApiError)) return 'Something went wrong. Your input is kept; try again.';
  const special = FORM_MESSAGES[error.code];
  return special === undefined ? error.message : special;
}
