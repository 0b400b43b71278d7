import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Params } from 'nestjs-pino';
import type { AppConfig } from '../../config';

type Req = IncomingMessage & { id?: unknown; originalUrl?: string; route?: { path?: string }; user?: { id?: number; shopId?: number } };

const SECRET_QUERY = /^(token|access_token|secret|password|code|sig|signature)$/i;
/** A long opaque path segment (owner-link secret, upload id): logged as [redacted], not as itself. */
const OPAQUE_SEGMENT = /^[A-Za-z0-9_-]{24,}$/;
const REQUEST_ID = /^[A-Za-z0-9._-]{1,64}$/;

/** The user, shop and route pattern of a finished request. */
function whoAndWhere(req: IncomingMessage) {
  const r = req as Req;
  return { userId: r.user?.id ?? null, shopId: r.user?.shopId ?? null, route: r.route?.path ?? null };
}

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
 * Structured request logs (nestjs-pino / pino-http): one line per request with its id,
 * user, shop, route pattern, status and duration. Headers are not logged at all; the
 * redact paths are a second line of defence for anything that logs a request or body.
 */
export function requestLogging(cfg: AppConfig): Params {
  return {
    pinoHttp: {
      level: cfg.LOG_LEVEL,
      genReqId: (req: IncomingMessage, res: ServerResponse) => {
        const given = req.headers['x-request-id'];
        const id = typeof given === 'string' && REQUEST_ID.test(given) ? given : randomUUID();
        res.setHeader('x-request-id', id);
        return id;
      },
      // Added to the finished line only: a customProps function would make pino-http build two
      // more child loggers on every request, logged or not (a fifth of a jobs-list request's CPU).
      customSuccessObject: (req: IncomingMessage, _res: ServerResponse, val: object) => ({ ...whoAndWhere(req), ...val }),
      customErrorObject: (req: IncomingMessage, _res: ServerResponse, _err: Error, val: object) => ({ ...whoAndWhere(req), ...val }),
      customLogLevel: (_req: IncomingMessage, res: ServerResponse, err?: Error) =>
        err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info',
      autoLogging: { ignore: (req: IncomingMessage) => req.url === '/api/health' || req.url === '/api/health/ready' },
      serializers: {
        req: (req: { id: unknown; method: string; url: string; raw?: Req }) => ({
          id: req.id,
          method: req.method,
          url: redactUrl(req.raw?.originalUrl ?? req.url),
        }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
      redact: {
        paths: [
          'req.headers.authorization',
          'req.headers.cookie',
          'req.headers["x-csrf-token"]',
          'res.headers["set-cookie"]',
          'password',
          '*.password',
          '*.newPassword',
          '*.currentPassword',
          '*.token',
          'token',
        ],
        censor: '[redacted]',
      },
    },
  };
}
