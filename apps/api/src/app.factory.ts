import { Logger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import compression from 'compression';
import cookieParser from 'cookie-parser';
import expressStaticGzip from 'express-static-gzip';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import helmet from 'helmet';
import { json, urlencoded, type NextFunction, type Request, type Response } from 'express';
import { annotationSaveBody } from './annotations';
import { setUpOpenApi } from './app.docs';
import { AppModule } from './app.module';
import type { AppConfig } from './config';
import { ErrorFilter } from './core/http';
import { createLogger, NestPinoLogger, requestLog } from './core/logging';
import { MetricsService } from './metrics';
import { SeedService } from './seed';

/** The routes that send stored media files (staff and owner-page), e.g. /api/media/12/screen. */
const MEDIA_BYTES = /^\/api\/(?:media|owner\/[^/]+\/media)\/\d+\/(?:original|thumb|screen|print|poster)$/;

/** Builds the whole server (API, OpenAPI document, built web app) for main.ts and the e2e tests. */
export async function createApp(cfg: AppConfig, opts: { logger?: boolean } = {}): Promise<NestExpressApplication> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.register(cfg), {
    logger: opts.logger === false ? false : ['log', 'warn', 'error'],
    bufferLogs: opts.logger !== false,
    // Nest's body parsers would read every GET's empty body too; bodyParsers() below skips GET and HEAD.
    bodyParser: false,
  });
  // One pino logger: a line per request, and Nest's own log lines as JSON at LOG_LEVEL.
  const logger = createLogger(cfg);
  if (opts.logger !== false) app.useLogger(new NestPinoLogger(logger));
  app.use(requestLog(logger));
  await app.get(MetricsService).install(app);
  // Behind a proxy, TRUST_PROXY says which hops may set X-Forwarded-For; without it req.ip is the socket's address.
  app.set('trust proxy', trustProxy(cfg.TRUST_PROXY));
  app.use(helmet({ contentSecurityPolicy: { directives: contentSecurity() } }));
  // JSON lists and the OpenAPI document. Media bytes (JPEG, MP4…) are already compressed: their routes skip the middleware,
  // and so does a client that accepts no encoding (scripts): the middleware wraps the response for nothing there.
  const compress = compression({ threshold: 1024 });
  app.use((req: Request, res: Response, next: NextFunction) =>
    !req.headers['accept-encoding'] || MEDIA_BYTES.test(req.path) ? next() : compress(req, res, next),
  );
  app.use(cookieParser());
  // A CSV import carries a whole spreadsheet (IMPORT_MAX_CHARS); every other JSON body keeps the default 100 kB limit.
  // Wrapped: Nest skips its own JSON parser when it finds a middleware named 'jsonParser' anywhere in the stack.
  const importJson = json({ limit: '6mb' });
  app.use('/api/imports', (req: Request, res: Response, next: NextFunction) => importJson(req, res, next));
  app.use(annotationSaveBody());
  app.use(bodyParsers());
  app.setGlobalPrefix('api');
  app.useGlobalFilters(new ErrorFilter());
  setUpOpenApi(app);
  serveWeb(app, cfg.WEB_DIST);
  await seedWhenEmpty(app, cfg);
  return app;
}

/**
 * JSON and form bodies for every other route, as Nest would parse them, but not for GET and HEAD, which carry none.
 * The payment provider signs the exact bytes it sent; its webhook needs them (req.rawBody).
 */
function bodyParsers() {
  const verify = (req: Request & { rawBody?: Buffer }, _res: Response, buf: Buffer) => {
    req.rawBody = buf;
  };
  const parseJson = json({ verify });
  const parseForm = urlencoded({ extended: true, verify });
  return (req: Request, res: Response, next: NextFunction) => {
    if (req.method === 'GET' || req.method === 'HEAD') return next();
    parseJson(req, res, (err?: unknown) => (err ? next(err) : parseForm(req, res, next)));
  };
}

/** Express 'trust proxy' from the environment: `true`/`false`, a hop count, or addresses/subnet names. */
function trustProxy(value: string | undefined): boolean | number | string {
  if (value === undefined || value === 'false') return false;
  if (value === 'true') return true;
  return /^\d+$/.test(value) ? Number(value) : value;
}

function contentSecurity() {
  return {
    defaultSrc: ["'self'"],
    imgSrc: ["'self'", 'data:', 'blob:'],
    mediaSrc: ["'self'", 'blob:'],
    styleSrc: ["'self'", "'unsafe-inline'"],
    fontSrc: ["'self'", 'data:'],
    connectSrc: ["'self'"],
    workerSrc: ["'self'", 'blob:'],
  };
}

/**
 * The built web app on the same port. API calls never touch the disk here: the static
 * middleware sits behind a path check. Hashed assets are served precompressed (brotli,
 * else gzip, made at build time) and cached for good; index.html is revalidated.
 */
function serveWeb(app: NestExpressApplication, dist: string): void {
  const index = resolve(dist, 'index.html');
  if (!existsSync(index)) {
    new Logger('Web').warn(`No built web app at ${dist}; run npm run build`);
    return;
  }
  const assets = expressStaticGzip(dist, {
    enableBrotli: true,
    orderPreference: ['br', 'gzip'],
    index: false,
    serveStatic: {
      index: false,
      setHeaders: (res, path) => {
        const hashed = path.includes('/assets/');
        res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
      },
    },
  });
  app.use((req: Request, res: Response, next: NextFunction) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    assets(req, res, () => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(index);
    });
  });
}

async function seedWhenEmpty(app: NestExpressApplication, cfg: AppConfig): Promise<void> {
  const seed = app.get(SeedService);
  if (cfg.SEED_DEMO && seed.isEmpty()) await seed.seedDemo();
}
