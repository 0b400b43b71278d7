import { z } from 'zod';

/**
 * Every error code the api returns. One filter maps a code to its HTTP
 * status and default message; the web switches on `code`, never on text.
 */
export const ERROR_CODES = {
  VALIDATION_FAILED: { status: 400, message: 'Some fields need attention.' },
  UNAUTHENTICATED: { status: 401, message: 'Please sign in.' },
  SESSION_EXPIRED: { status: 401, message: 'Your session has ended. Please sign in again.' },
  INVALID_CREDENTIALS: { status: 401, message: 'E-mail or password is not right.' },
  FORBIDDEN: { status: 403, message: 'Your role does not allow this.' },
  CSRF_MISMATCH: { status: 403, message: 'The page is out of date. Reload and try again.' },
  NOT_FOUND: { status: 404, message: 'Not found.' },
  CONFLICT: { status: 409, message: 'This was changed by someone else or already exists.' },
  JOB_CLOSED: { status: 409, message: 'The bike has been handed back, so this job’s records are frozen. A manager can still correct them.' },
  ILLEGAL_TRANSITION: { status: 409, message: 'The job cannot move to that status from where it is.' },
  LAST_MANAGER: { status: 409, message: 'A shop needs at least one active manager.' },
  EMAIL_TAKEN: { status: 409, message: 'That e-mail address already has an account.' },
  FINAL_CHECK_SAME_PERSON: { status: 409, message: 'The final check must be done by someone other than the job’s mechanic.' },
  FINAL_CHECK_REQUIRED: { status: 409, message: 'Record a passed final check before marking the job ready.' },
  PAIR_NOT_A_STILL: { status: 422, message: 'Only photos and scope stills can be paired, not videos.' },
  PAIR_WRONG_PHASE: { status: 422, message: 'A pair needs a shot tagged Before and a shot tagged After.' },
  PAIR_OTHER_JOB: { status: 422, message: 'Both shots of a pair must belong to this job.' },
  PAIR_EXISTS: { status: 409, message: 'These two shots are already a pair.' },
  REPORT_NOT_SENT: { status: 409, message: 'No report has been sent for this job. Confirm to hand the bike over without one.' },
  NO_OWNER_EMAIL: { status: 422, message: 'The owner has no e-mail address on file.' },
  MESSAGE_NOT_RESENDABLE: { status: 409, message: 'Only a message that finally failed can be sent again.' },
  UNPAID_BALANCE: { status: 409, message: 'This job still has money due. Say why the bike goes home unpaid to hand it over.' },
  NOTHING_DUE: { status: 409, message: 'Nothing is due on this job.' },
  NOT_READY_TO_PAY: { status: 409, message: 'Payment opens when the bike is ready to collect.' },
  PAYMENT_PROVIDER_ERROR: { status: 502, message: 'The card payment service did not answer. Try again in a moment.' },
  WEBHOOK_SIGNATURE_INVALID: { status: 400, message: 'The notification signature is missing or not valid.' },
  REFUND_TOO_LARGE: { status: 422, message: 'A refund cannot be more than what is left of that payment.' },
  PHONE_INVALID: { status: 422, message: 'This is not a valid phone number. Add the country code (e.g. +44) if the number is from abroad.' },
  NO_OWNER_PHONE: { status: 422, message: 'The owner has no mobile number on file.' },
  TEXTS_OPTED_OUT: { status: 409, message: 'The owner replied STOP and gets no more texts.' },
  FILE_TOO_LARGE: { status: 413, message: 'The file is too large.' },
  BODY_TOO_LARGE: { status: 413, message: 'The request is too large.' },
  TUS_VERSION_REQUIRED: { status: 412, message: 'Resumable upload requests need the header Tus-Resumable: 1.0.0.' },
  TUS_HEADER_INVALID: { status: 400, message: 'A resumable upload header is missing or not valid.' },
  UPLOAD_OFFSET_CONFLICT: { status: 409, message: 'The upload is at a different offset; ask for the offset and resume from there.' },
  UPLOAD_GONE: { status: 410, message: 'This upload no longer exists. Start it again.' },
  UPLOAD_BUSY: { status: 423, message: 'Another request is writing this upload. Try again in a moment.' },
  UNSUPPORTED_MEDIA_TYPE: { status: 415, message: 'This file type is not supported.' },
  FILE_EMPTY: { status: 422, message: 'The file is empty.' },
  FILE_CORRUPT: { status: 422, message: 'The file could not be read.' },
  IMAGE_TOO_LARGE: { status: 422, message: 'The image has too many pixels to process.' },
  VIDEO_UNREADABLE: { status: 422, message: 'This video could not be read: no playable picture track or no length was found.' },
  OWNER_LINK_INVALID: { status: 404, message: 'This link is not valid. Ask the shop to send you a new one.' },
  OWNER_LINK_EXPIRED: { status: 410, message: 'This link has expired. Ask the shop to send you a new one.' },
  OWNER_LINK_REVOKED: { status: 410, message: 'This link was withdrawn by the shop. Ask the shop to send you a new one.' },
  PRICE_CHANGED: { status: 409, message: 'The shop changed this price after you opened the page. Check the new price and decide again.' },
  SAFETY_CONFIRMATION_REQUIRED: { status: 422, message: 'Declining a safety item needs a second confirmation.' },
  NO_CONSENT: { status: 409, message: 'The owner has not consented to showing this job’s photos, or the consent does not cover this.' },
  CONSENT_REVOKED: { status: 409, message: 'The owner withdrew consent for this job. Its photos can no longer be exported; take down any you published.' },
  SHOWCASE_DESK_OFF: { status: 403, message: 'This shop has not opened the showcase to the front desk. A manager can allow it in Shop settings.' },
  CONSENT_WORDING_CHANGED: { status: 409, message: 'The consent wording has changed. Read it again before deciding.' },
  REPORT_NOT_READY: { status: 409, message: 'The report is still rendering or failed to render.' },
  WEAK_PASSWORD: { status: 422, message: 'Choose a password that is harder to guess: not a common one and not made from your name or the shop’s.' },
  SETUP_CODE_INVALID: { status: 403, message: 'That setup code is not right. It is printed in the server’s log when it starts.' },
  LINK_INVALID: { status: 410, message: 'This link is not valid any more: it was used, withdrawn or has expired. Ask for a new one.' },
  LINK_EXPIRED: { status: 410, message: 'This link has expired. Ask for a new one.' },
  CODE_INVALID: { status: 401, message: 'That code is not right. Check the time on your phone and try the newest code.' },
  TWO_FACTOR_REQUIRED: { status: 409, message: 'This shop requires two-step sign-in for every account, so it cannot be turned off.' },
  RATE_LIMITED: { status: 429, message: 'Too many attempts. Wait a moment and try again.' },
  INTERNAL: { status: 500, message: 'Something went wrong on our side.' },
  STORAGE_FULL: {
    status: 507,
    message:
      'The server’s disk is full, so this was not saved. Keep the photo on this device and tell the shop manager: space must be freed before anything more can be saved.',
  },
  NOT_READY: { status: 503, message: 'The server is starting or cannot reach its database or task runner.' },
} as const satisfies Record<string, { status: number; message: string }>;

export type ErrorCode = keyof typeof ERROR_CODES;

/** All codes, for enums and exhaustive switches. */
export const ERROR_CODE_LIST = Object.keys(ERROR_CODES) as [ErrorCode, ...ErrorCode[]];

/** HTTP status for a code. */
export function httpStatusFor(code: ErrorCode): number {
  return ERROR_CODES[code].status;
}

/** Default message for a code. */
export function defaultMessageFor(code: ErrorCode): string {
  return ERROR_CODES[code].message;
}

export const ErrorCodeSchema = z.enum(ERROR_CODE_LIST);

/** One field problem: dotted path ("newBike.year") and message. */
export const FieldIssueSchema = z.object({ path: z.string(), message: z.string() });
export type FieldIssue = z.infer<typeof FieldIssueSchema>;

/** The body of every error response. */
export const ErrorBodySchema = z.object({
  code: ErrorCodeSchema,
  message: z.string(),
  details: z.unknown(),
});
export type ErrorBody = z.infer<typeof ErrorBodySchema>;

/**
 * VALIDATION_FAILED details from a zod error: `{ issues: [{ path, message }] }`,
 * so a form can put each message under its field.
 */
export function validationDetails(error: z.ZodError): { issues: FieldIssue[] } {
  return {
    issues: error.issues.map((issue) => ({
      path: issue.path.map(String).join('.'),
      message: issue.message,
    })),
  };
}
