import { z } from 'zod';
import { ERROR_CODES, ErrorBodySchema, defaultMessageFor, httpStatusFor, validationDetails, type ErrorCode } from './errors';

describe('error codes', () => {
  it.each<[ErrorCode, number]>([
    ['VALIDATION_FAILED', 400],
    ['UNAUTHENTICATED', 401],
    ['SESSION_EXPIRED', 401],
    ['INVALID_CREDENTIALS', 401],
    ['FORBIDDEN', 403],
    ['CSRF_MISMATCH', 403],
    ['NOT_FOUND', 404],
    ['ILLEGAL_TRANSITION', 409],
    ['LAST_MANAGER', 409],
    ['FILE_TOO_LARGE', 413],
    ['UNSUPPORTED_MEDIA_TYPE', 415],
    ['RATE_LIMITED', 429],
    ['INTERNAL', 500],
  ])('%s → HTTP %i (status meanings per RFC 9110 / RFC 6585 for 429)', (code, status) => {
    expect(httpStatusFor(code)).toBe(status);
    expect(defaultMessageFor(code).length).toBeGreaterThan(5);
  });

  it('every code has a 4xx/5xx status and a message ending in a full stop', () => {
    for (const [code, { status, message }] of Object.entries(ERROR_CODES)) {
      expect(status, code).toBeGreaterThanOrEqual(400);
      expect(status, code).toBeLessThan(600);
      expect(message, code).toMatch(/\.$/);
    }
  });

  it('ErrorBody rejects unknown codes', () => {
    expect(ErrorBodySchema.safeParse({ code: 'NOT_FOUND', message: 'Not found.', details: null }).success).toBe(true);
    expect(ErrorBodySchema.safeParse({ code: 'TEAPOT', message: 'x', details: null }).success).toBe(false);
  });

  it('validationDetails gives dotted paths for forms', () => {
    const r = z.object({ newBike: z.object({ year: z.int() }) }).safeParse({ newBike: { year: 'old' } });
    expect(r.success).toBe(false);
    expect(validationDetails(r.error as z.ZodError).issues.map((i) => i.path)).toEqual(['newBike.year']);
  });
});
