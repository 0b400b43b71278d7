import { type ChildProcess, spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';

/** Debian's redis-server (`apt-get install redis-server`; .ci/run installs it). */
export const REDIS_SERVER_BIN = process.env.REDIS_SERVER_BIN ?? '/usr/bin/redis-server';

/** Why the Redis suites cannot run here, or null when they can. */
export function redisMissingReason(): string | null {
  return existsSync(REDIS_SERVER_BIN) ? null : `${REDIS_SERVER_BIN} is not installed (apt-get install redis-server); the Redis suites are skipped`;
}

export interface RedisServer {
  url: string;
  port: number;
  stop: () => Promise<void>;
}

export async function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const srv = createServer()
      .once('error', fail)
      .listen(0, '127.0.0.1', () => {
        const { port } = srv.address() as { port: number };
        srv.close(() => done(port));
      });
  });
}

/** A throw-away Redis on a free loopback port: no snapshots, no append-only file; stopped by its pid. */
export async function startRedisServer(): Promise<RedisServer> {
  const port = await freePort();
  const child = spawn(REDIS_SERVER_BIN, ['--port', String(port), '--bind', '127.0.0.1', '--save', '', '--appendonly', 'no'], {
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  await readyOrExit(child);
  return {
    url: `redis://127.0.0.1:${port}`,
    port,
    stop: async () => {
      if (child.exitCode !== null) return;
      const gone = new Promise((r) => child.once('exit', r));
      child.kill('SIGTERM');
      await gone;
    },
  };
}

function readyOrExit(child: ChildProcess): Promise<void> {
  let out = '';
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`redis-server did not start: ${out}`)), 15_000);
    child.stdout?.on('data', (d: Buffer) => {
      out += String(d);
      if (out.includes('Ready to accept connections')) {
        clearTimeout(timer);
        resolve();
      }
    });
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`redis-server exited with ${code}: ${out}`));
    });
  });
}
