import type Database from 'better-sqlite3';
import type { Histogram, Registry } from 'prom-client';
import { storageErrorRows } from '../infra/storage';

export interface AppMetrics {
  registry: Registry;
  requests: Histogram<'method' | 'route' | 'status'>;
}

/**
 * The server's metrics, made only when METRICS_PORT or METRICS_TOKEN is set (prom-client is loaded then, not at boot).
 * Queue depth and age, the mail outbox and storage errors are read at scrape time: one grouped query each on SQLite.
 */
export async function createMetrics(sqlite: Database.Database, now: () => number): Promise<AppMetrics> {
  const prom = await import('prom-client');
  const registry = new prom.Registry();
  prom.collectDefaultMetrics({ register: registry, prefix: 'benchproof_' });
  const requests = new prom.Histogram({
    name: 'benchproof_http_request_duration_seconds',
    help: 'API requests by route pattern, method and status class; its _count gives the request rate.',
    labelNames: ['method', 'route', 'status'] as const,
    buckets: [0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10],
    registers: [registry],
  });
  queueMetrics(prom, registry, sqlite, now);
  return { registry, requests };
}

/** Gauges read at scrape time: tasks not done by kind and state, the oldest queued task's age, the mail outbox, storage errors. */
function queueMetrics(prom: typeof import('prom-client'), registry: Registry, sqlite: Database.Database, now: () => number): void {
  const tasksByState = sqlite.prepare(`SELECT kind, status, count(*) AS n, min(created_at) AS oldest FROM tasks WHERE status <> 'done' GROUP BY kind, status`);
  new prom.Gauge({
    name: 'benchproof_tasks',
    help: 'Background tasks not done, by kind and state (queued, running, failed).',
    labelNames: ['kind', 'state'] as const,
    registers: [registry],
    collect() {
      this.reset();
      for (const r of tasksByState.all() as { kind: string; status: string; n: number }[]) this.set({ kind: r.kind, state: r.status }, r.n);
    },
  });
  new prom.Gauge({
    name: 'benchproof_tasks_oldest_age_seconds',
    help: 'Age of the oldest queued background task, by kind (how far behind the queue is).',
    labelNames: ['kind'] as const,
    registers: [registry],
    collect() {
      this.reset();
      for (const r of tasksByState.all() as { kind: string; status: string; oldest: number }[])
        if (r.status === 'queued') this.set({ kind: r.kind }, Math.max(0, (now() - r.oldest) / 1000));
    },
  });
  const outbox = sqlite.prepare(`SELECT status, count(*) AS n FROM outbox_messages WHERE status <> 'sent' GROUP BY status`);
  new prom.Gauge({
    name: 'benchproof_mail_outbox',
    help: 'E-mails not yet delivered, by state (queued, sending, failed).',
    labelNames: ['state'] as const,
    registers: [registry],
    collect() {
      this.reset();
      for (const state of ['queued', 'sending', 'failed']) this.set({ state }, 0);
      for (const r of outbox.all() as { status: string; n: number }[]) this.set({ state: r.status }, r.n);
    },
  });
  new prom.Counter({
    name: 'benchproof_storage_errors_total',
    help: 'Failed media storage operations since start, by operation and error code (e.g. ENOSPC).',
    labelNames: ['operation', 'code'] as const,
    registers: [registry],
    collect() {
      this.reset();
      for (const [operation, code, n] of storageErrorRows()) this.inc({ operation, code }, n);
    },
  });
}
