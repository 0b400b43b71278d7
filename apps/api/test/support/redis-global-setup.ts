import type { TestProject } from 'vitest/node';
import { redisMissingReason, startRedisServer } from './redis-server';

declare module 'vitest' {
  export interface ProvidedContext {
    /** The Redis the api-redis project's test apps share (each under its own key prefix); null when redis-server is missing. */
    redisUrl: string | null;
  }
}

/** One redis-server for the whole api-redis run, stopped at its end. */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const missing = redisMissingReason();
  if (missing) {
    console.log(`[api-redis] ${missing}`);
    project.provide('redisUrl', null);
    return () => Promise.resolve();
  }
  const server = await startRedisServer();
  project.provide('redisUrl', server.url);
  return server.stop;
}
