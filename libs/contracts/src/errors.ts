import { z } from 'zod';

/**
 * Every error the API returns carries one of these codes; the web switches on the code,
 * never on the message. Status is the HTTP status the API answers with.
 */
export const ERROR_CODES = {
  VALIDATION_FAILED: { status: 400, message: 'Some fields need attention.' },
  UNAUTHENTICATED: { status: 401, message: 'Please sign in.' },
  SESSION_EXPIRED: { status: 401, message: 'Your session has expired. Please sign in again.' },
  INVALID_CREDENTIALS: { status: 401, message: 'E-mail or password is not right.' },
  FORBIDDEN: { status: 403, message: 'Your role does not allow this.' },
  CSRF_MISMATCH: { status: 403, message: 'The page is out of date. Reload it and try again.' },
  NOT_FOUND: { status: 404, message: 'Not found.' },
  CONFLICT: { status: 409, message: 'That conflicts with the current state.' },
  ILLEGAL_TRANSITION: { status: 409, message: 'The job cannot move to that status from here.' },
  LAST_MANAGER: { status: 409, message: 'The shop needs at least one active manager.' },
  EMAIL_TAKEN: { status: 409, message: 'That e-mail address already has an account.' },
  FINAL_CHECK_SAME_PERSON: { status: 409, message: 'The final check must be done by someone other than the job’s mechanic.' },
  FILE_TOO_LARGE: { status: 413, message: 'The file is larger than this shop allows.' },
  UNSUPPORTED_MEDIA_TYPE: { status: 415, message: 'That kind of file is not accepted.' },
  FILE_EMPTY: { status: 422, message: 'The file is empty.' },
  FILE_CORRUPT: { status: 422, message: 'The file is damaged or incomplete.' },
  IMAGE_TOO_LARGE: { status: 422, message: 'The image has too many pixels to process safely.' },
  RATE_LIMITED: { status: 429, message: 'Too many attempts. Wait a minute and try again.' },
  INTERNAL: { status: 500, message: 'Something went wrong on our side.' },
} as const satisfies Record<string, { status: number; message: string }>;

export type ErrorCode = keyof typeof ERROR_CODES;

export const ErrorCodeSchema = z.enum(Object.keys(ERROR_CODES) as [ErrorCode, ...ErrorCode[]]);

export const ErrorBodySchema = z.object({
  code: ErrorCodeSchema,
  message: z.string(),
  details: z.unknown(),
});
export type ErrorBody = z.infer<typeof ErrorBodySchema>;
