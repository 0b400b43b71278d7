import type { INestApplication } from '@nestjs/common';
import type { Server } from 'node:http';

export interface DrainOptions {
  graceMs: number;
  /** Stops the background runner taking new work (and bounds its running tasks by the same grace). */
  stopTasks: (graceMs: number) => Promise<void>;
  log: (message: string) => void;
}

const sleep = (ms: number) => new Promise((ok) => setTimeout(ok, ms));

/**
 * SIGTERM and SIGINT drain the server: the listener closes at once (a new connection is refused, idle keep-alive
 * connections are closed), requests in flight get up to `graceMs` to finish (an upload being sent completes),
 * the task runner takes nothing new and releases the leases of tasks still running at the end of the grace, then
 * Nest's shutdown closes the database. A second signal exits at once.
 */
export function drainOnSignals(app: INestApplication, opts: DrainOptions): void {
  const server = app.getHttpServer() as Server;
  let inFlight = 0;
  server.on('request', (_req, res) => {
    inFlight++;
    res.once('close', () => inFlight--);
  });
  let draining = false;
  const drain = async (signal: string) => {
    if (draining) process.exit(1);
    draining = true;
    const deadline = Date.now() + opts.graceMs;
    opts.log(`${signal}: draining (${inFlight} request(s) in flight, grace ${opts.graceMs} ms)`);
    server.close();
    const tasks = opts.stopTasks(opts.graceMs);
    while (inFlight > 0 && Date.now() < deadline) {
      server.closeIdleConnections();
      await sleep(25);
    }
    if (inFlight > 0) opts.log(`${inFlight} request(s) cut off after the grace`);
    server.closeAllConnections();
    await tasks;
    await app.close();
    opts.log('drained; exiting');
    process.exit(0);
  };
  for (const signal of ['SIGTERM', 'SIGINT'] as const) process.on(signal, () => void drain(signal));
}
