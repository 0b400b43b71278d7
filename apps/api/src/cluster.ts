import cluster, { type Worker } from 'node:cluster';
import { Logger } from '@nestjs/common';

/**
 * WEB_CONCURRENCY=N (>1, with REDIS_URL): this primary process serves nothing itself; it forks N
 * API processes that share the one port (node:cluster hands connections out round-robin) and the
 * one SQLite database (WAL). The first is started alone and must be listening before the others
 * start, so only it applies migrations and seeds a new database. A process that dies is replaced
 * (at most once a second); SIGTERM/SIGINT go to every process and the primary leaves with the last.
 */
export async function runPrimary(processes: number): Promise<void> {
  const logger = new Logger('Cluster');
  let stopping = false;
  let lastRestart = 0;
  const fork = (): Promise<Worker> =>
    new Promise((resolve, reject) => {
      const worker = cluster.fork();
      worker.once('listening', () => resolve(worker));
      worker.once('exit', (code) => reject(new Error(`API process ${worker.process.pid} exited with ${code} before listening`)));
    });
  let serving = false;
  cluster.on('exit', (worker, code, signal) => {
    if (stopping) {
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(0);
      return;
    }
    if (!serving) return; // a process that dies while starting rejects its fork: start-up fails below
    logger.warn(`API process ${worker.process.pid} ended (${signal ?? code}); starting another`);
    const wait = Math.max(0, lastRestart + 1000 - Date.now());
    lastRestart = Date.now() + wait;
    setTimeout(() => void fork().catch((e: Error) => logger.error(e.message)), wait);
  });
  await fork();
  await Promise.all(Array.from({ length: processes - 1 }, fork));
  serving = true;
  logger.log(
    `${processes} API processes serving (pids ${Object.values(cluster.workers ?? {})
      .map((w) => w?.process.pid)
      .join(', ')})`,
  );
  for (const signal of ['SIGTERM', 'SIGINT'] as const) {
    process.on(signal, () => {
      stopping = true;
      for (const w of Object.values(cluster.workers ?? {})) w?.process.kill(signal);
    });
  }
}

export const isPrimaryOfMany = (processes: number): boolean => processes > 1 && cluster.isPrimary;
