import { Inject, Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type Database from 'better-sqlite3';
import type { NextFunction, Request, Response } from 'express';
import { createHash, timingSafeEqual } from 'node:crypto';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { SQLITE } from '../core/db';
import { createMetrics, type AppMetrics } from './metrics.registry';

const digest = (s: string) => createHash('sha256').update(s).digest();

/**
 * Prometheus metrics, off by default and never public: METRICS_PORT opens a second listener on METRICS_HOST
 * (loopback unless told otherwise), METRICS_TOKEN opens GET /api/metrics for `Authorization: Bearer <token>`
 * (and guards the second listener too). Neither set: nothing is measured and /api/metrics is a 404.
 */
@Injectable()
export class MetricsService implements OnApplicationShutdown {
  private readonly logger = new Logger('Metrics');
  private metrics: AppMetrics | null = null;
  private server: Server | null = null;

  constructor(
    @Inject(SQLITE) private readonly opened: { sqlite: Database.Database },
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /** Called by createApp before the routes are mounted, so every API request passes the timer. */
  async install(app: NestExpressApplication): Promise<void> {
    if (this.cfg.METRICS_PORT === undefined && this.cfg.METRICS_TOKEN === undefined) return;
    const metrics = await createMetrics(this.opened.sqlite, () => this.clock.now().getTime());
    this.metrics = metrics;
    app.use((req: Request, res: Response, next: NextFunction) => this.time(metrics, req, res, next));
    if (this.cfg.METRICS_TOKEN !== undefined) app.use('/api/metrics', (req: Request, res: Response) => void this.answer(req, res));
    if (this.cfg.METRICS_PORT !== undefined) await this.listen(this.cfg.METRICS_PORT);
  }

  /** The second listener's address (tests ask for port 0). */
  address(): AddressInfo | null {
    return (this.server?.address() as AddressInfo | null) ?? null;
  }

  async onApplicationShutdown(): Promise<void> {
    const server = this.server;
    this.server = null;
    if (server) await new Promise<void>((done) => server.close(() => done()));
  }

  private time(metrics: AppMetrics, req: Request, res: Response, next: NextFunction): void {
    if (!req.path.startsWith('/api/') || req.path === '/api/metrics') return next();
    const end = metrics.requests.startTimer();
    res.once('close', () => {
      const route = (req.route as { path?: string } | undefined)?.path ?? '(unmatched)';
      end({ method: req.method, route, status: `${Math.floor(res.statusCode / 100)}xx` });
    });
    next();
  }

  private allowed(req: IncomingMessage): boolean {
    const token = this.cfg.METRICS_TOKEN;
    if (token === undefined) return true;
    const given = /^Bearer (.+)$/.exec(req.headers.authorization ?? '')?.[1] ?? '';
    return timingSafeEqual(digest(given), digest(token));
  }

  private async answer(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const metrics = this.metrics;
    if (!metrics || req.method !== 'GET' || !this.allowed(req)) {
      // The same answer for "no such page" and "wrong token": the endpoint does not announce itself.
      res.writeHead(404, { 'content-type': 'application/json' }).end(JSON.stringify({ code: 'NOT_FOUND', message: 'Not found' }));
      return;
    }
    const body = await metrics.registry.metrics();
    res.writeHead(200, { 'content-type': metrics.registry.contentType, 'cache-control': 'no-store' }).end(body);
  }

  private listen(port: number): Promise<void> {
    const server = createServer((req, res) => {
      if (req.url?.split('?')[0] !== '/metrics') return void res.writeHead(404).end();
      void this.answer(req, res);
    });
    this.server = server;
    return new Promise((ok, fail) => {
      server.once('error', fail);
      server.listen(port, this.cfg.METRICS_HOST, () => {
        this.logger.log(`Metrics on http://${this.cfg.METRICS_HOST}:${this.address()?.port}/metrics`);
        ok();
      });
    });
  }
}
