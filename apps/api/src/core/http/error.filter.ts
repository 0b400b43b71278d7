import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, Logger } from '@nestjs/common';
import { ERROR_CODES, type ErrorBody, type ErrorCode } from '@benchproof/contracts';
import type { Response } from 'express';
import { DomainError } from './domain-error';
import { isStorageFull } from './storage-full';

const CODE_BY_STATUS: Record<number, ErrorCode> = {
  400: 'VALIDATION_FAILED',
  401: 'UNAUTHENTICATED',
  403: 'FORBIDDEN',
  404: 'NOT_FOUND',
  409: 'CONFLICT',
  413: 'FILE_TOO_LARGE',
  415: 'UNSUPPORTED_MEDIA_TYPE',
  429: 'RATE_LIMITED',
};

/**
 * A JSON or form body over the parser's limit arrives as an HttpException whose cause is
 * body-parser's http-error (type `entity.too.large`, with the limit); multer's own 413 is a file.
 */
function bodyTooLarge(exception: unknown): ErrorBody | null {
  const cause = exception instanceof HttpException ? (exception.cause as { type?: unknown; limit?: unknown } | undefined) : undefined;
  if (cause?.type !== 'entity.too.large') return null;
  return { code: 'BODY_TOO_LARGE', message: ERROR_CODES.BODY_TOO_LARGE.message, details: { limitBytes: typeof cause.limit === 'number' ? cause.limit : null } };
}

/** The single place errors become HTTP responses: always `{code, message, details}`. */
@Catch()
export class ErrorFilter implements ExceptionFilter {
  private readonly logger = new Logger('ErrorFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    const { status, body } = this.toBody(exception);
    if (status >= 500) this.logger.error(exception instanceof Error ? exception.stack : String(exception));
    const retryAfter = (body.details as { retryAfterSeconds?: unknown } | null)?.retryAfterSeconds;
    if (status === 429 && typeof retryAfter === 'number' && !res.headersSent) res.setHeader('Retry-After', String(retryAfter));
    if (!res.headersSent) res.status(status).json(body);
  }

  private toBody(exception: unknown): { status: number; body: ErrorBody } {
    if (exception instanceof DomainError) {
      return { status: exception.status, body: { code: exception.code, message: exception.message, details: exception.details } };
    }
    const body = bodyTooLarge(exception);
    if (body) return { status: 413, body };
    // A full uploads disk (ENOSPC) or database disk (SQLITE_FULL): say so, in words a desk person can act on.
    if (isStorageFull(exception)) return { status: 507, body: { code: 'STORAGE_FULL', message: ERROR_CODES.STORAGE_FULL.message, details: null } };
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      const code = CODE_BY_STATUS[status] ?? (status >= 500 ? 'INTERNAL' : 'VALIDATION_FAILED');
      const message = status === 404 ? 'No such route.' : ERROR_CODES[code].message;
      return { status, body: { code, message, details: null } };
    }
    return { status: 500, body: { code: 'INTERNAL', message: ERROR_CODES.INTERNAL.message, details: null } };
  }
}
