import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import express, { Router, type NextFunction, type Request, type Response } from 'express';

/** Every path the OpenAPI page serves starts so: /api/docs, /api/docs/swagger-ui-init.js, /api/docs-json, /api/docs-yaml. */
const DOCS_PREFIX = '/api/docs';

/**
 * The OpenAPI page and document on a router of their own, reached through one prefix check: on the app itself
 * their routes' regular expressions were tried for every API request before the controllers' routes.
 */
export function setUpOpenApi(app: NestExpressApplication): void {
  const config = new DocumentBuilder()
    .setTitle('BenchProof API')
    .setDescription('Service records, media and bench reports for bicycle workshops. Routes need a session cookie unless marked x-public.')
    .setVersion('0.1.0')
    .addCookieAuth('bp_session')
    .build();
  const docs = Router();
  // Built on the first request for it, not at boot: the document and the JSON schemas behind it are
  // several MB of heap that a workshop's server otherwise keeps without ever serving.
  SwaggerModule.setup('api/docs', onRouter(app, docs), () => SwaggerModule.createDocument(app, config), {
    jsonDocumentUrl: 'api/docs-json',
  });
  app.use((req: Request, res: Response, next: NextFunction) => (req.path.startsWith(DOCS_PREFIX) ? docs(req, res, next) : next()));
}

/** The app as SwaggerModule sees it, with its GET routes and static files registered on `docs` instead. */
function onRouter(app: NestExpressApplication, docs: Router): NestExpressApplication {
  const adapter = app.getHttpAdapter();
  const routed = new Proxy(adapter, {
    get(target, prop) {
      if (prop === 'get') return (path: string, handler: express.RequestHandler) => docs.get(path, handler);
      const value: unknown = Reflect.get(target, prop);
      return typeof value === 'function' ? (value as (...a: unknown[]) => unknown).bind(target) : value;
    },
  });
  return new Proxy(app, {
    get(target, prop) {
      if (prop === 'getHttpAdapter') return () => routed;
      if (prop === 'useStaticAssets') return (root: string, options: { prefix: string }) => docs.use(options.prefix, express.static(root, { index: false }));
      return Reflect.get(target, prop) as unknown;
    },
  });
}
