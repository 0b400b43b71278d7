import type { LoggerService } from '@nestjs/common';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { randomUUID } from 'node:crypto';
import pino, { type DestinationStream, type Level, type Logger } from 'pino';
import type { AppConfig } from '../../config';

const SECRET_QUERY = /^(token|access_token|secret|password|code|sig|signature)$/i;
/** A long opaque path segment (owner-link secret, upload id): logged as [redacted], not as itself. */
const OPAQUE_SEGMENT = /^[A-Za-z0-9_-]{24,}$/;
const REQUEST_ID = /^[A-Za-z0-9._-]{1,64}$/;
const UNLOGGED = new Set(['/api/health', '/api/health/ready']);

type LoggedRequest = Request & { user?: { id?: number; shopId?: number } };

/** The URL with secrets taken out: token-like query values and long opaque path segments. */
export function redactUrl(url: string): string {
  const [path, query] = url.split('?', 2);
  const safePath = path
    .split('/')
    .map((s) => (OPAQUE_SEGMENT.test(s) ? '[redacted]' : s))
    .join('/');
  if (query === undefined) return safePath;
  const params = new URLSearchParams(query);
  for (const key of [...params.keys()]) if (SECRET_QUERY.test(key)) params.set(key, '[redacted]');
  return `${safePath}?${params.toString()}`;
}

/**
 * The process's one pino logger, JSON at LOG_LEVEL. It writes asynchronously (sonic-boom with
 * `sync: false`, flushed when the process exits): a synchronous write to stdout per request line
 * was a tenth of a signed-in request's CPU. The redact paths are a second line of defence for
 * anything that logs a request or body; request lines carry no headers at all.
 */
export function createLogger(cfg: Pick<AppConfig, 'LOG_LEVEL'>, destination?: DestinationStream): Logger {
  const options = {
    level: cfg.LOG_LEVEL,
    redact: {
      paths: ['req.headers.authorization', 'req.headers.cookie', 'req.headers["x-csrf-token"]', 'res.headers["set-cookie"]'].concat([
        'password',
        '*.password',
        '*.newPassword',
        '*.currentPassword',
        '*.token',
        'token',
      ]),
      censor: '[redacted]',
    },
  };
  return pino(options, destination ?? pino.destination({ dest: 1, sync: false }));
}

const levelOf = (status: number, aborted: boolean): Level => (status >= 500 ? 'error' : status >= 400 || aborted ? 'warn' : 'info');

/**
 * One line per finished request: request id (x-request-id when sane, else a new UUID, echoed back),
 * method, redacted URL, status, duration in ms, user, shop and route pattern. Built when the response
 * closes and only when its level is on; no child logger and no async context per request.
 */
export function requestLog(root: Logger): RequestHandler {
  // Request lines are built from known fields only (no headers, no bodies, URL redacted above), so they skip
  // the redact pass, which cost more than the rest of writing a line (pino 10, ~9 µs of ~15). Made once.
  const logger = root.child({}, { redact: [] });
  return (req: Request, res: Response, next: NextFunction) => {
    const given = req.headers['x-request-id'];
    const id = typeof given === 'string' && REQUEST_ID.test(given) ? given : randomUUID();
    res.setHeader('x-request-id', id);
    if (UNLOGGED.has(req.url)) return next();
    const start = performance.now();
    res.once('close', () => {
      const aborted = !res.writableFinished;
      const level = levelOf(res.statusCode, aborted);
      if (!logger.isLevelEnabled(level)) return;
      const r = req as LoggedRequest;
      logger[level](
        {
          req: { id, method: req.method, url: redactUrl(req.originalUrl ?? req.url) },
          res: { statusCode: res.statusCode },
          responseTime: Math.round(performance.now() - start),
          userId: r.user?.id ?? null,
          shopId: r.user?.shopId ?? null,
          route: (req.route as { path?: string } | undefined)?.path ?? null,
          ...(aborted ? { aborted: true } : {}),
        },
        level === 'error' ? 'request errored' : aborted ? 'request aborted' : 'request completed',
      );
    });
    next();
  };
}

/** Nest's own log lines (bootstrap, `new Logger(ctx)` in services) as pino JSON with their context. */
export class NestPinoLogger implements LoggerService {
  constructor(private readonly logger: Logger) {}
  log = (message: unknown, ...rest: unknown[]) => this.write('info', message, rest);
  error = (message: unknown, ...rest: unknown[]) => this.write('error', message, rest);
  warn = (message: unknown, ...rest: unknown[]) => this.write('warn', message, rest);
  debug = (message: unknown, ...rest: unknown[]) => this.write('debug', message, rest);
  verbose = (message: unknown, ...rest: unknown[]) => this.write('trace', message, rest);
  fatal = (message: unknown, ...rest: unknown[]) => this.write('fatal', message, rest);

  private write(level: Level, message: unknown, rest: unknown[]): void {
    // Nest passes the context last (and a stack before it for errors).
    const context = typeof rest.at(-1) === 'string' ? (rest.at(-1) as string) : undefined;
    const stack = level === 'error' && typeof rest[0] === 'string' && rest.length > 1 ? rest[0] : undefined;
    if (message instanceof Error) this.logger[level]({ context, err: message });
    else if (typeof message === 'object' && message !== null) this.logger[level]({ context, ...message });
    else this.logger[level]({ context, ...(stack ? { stack } : {}) }, String(message));
  }
}
