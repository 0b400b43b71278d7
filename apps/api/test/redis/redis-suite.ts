import { inject } from 'vitest';
import { randomBytes } from 'node:crypto';

/** The shared redis-server of the api-redis run, or null (the global setup printed why). */
export const REDIS_URL = inject('redisUrl');

/** `describe` where Redis runs, else a skipped block that says why (printed once by the global setup too). */
export const describeRedis = (name: string, body: () => void): void => {
  if (REDIS_URL) describe(name, body);
  else describe.skip(`${name} (skipped: redis-server is not installed)`, body);
};

export const freshPrefix = (): string => `t${randomBytes(4).toString('hex')}`;

export const sleep = (ms: number): Promise<void> => new Promise((r) => setTimeout(r, ms));

/** Polls until `check` gives a value, or fails naming `what`. */
export async function until<T>(what: string, check: () => T | undefined | Promise<T | undefined>, ms = 60_000, every = 50): Promise<T> {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    const v = await check();
    if (v !== undefined) return v;
    await sleep(every);
  }
  throw new Error(`Timed out waiting for ${what}`);
}
