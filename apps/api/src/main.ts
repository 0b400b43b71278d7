import './threadpool';
import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { createApp } from './app.factory';
import { isPrimaryOfMany, runPrimary } from './cluster';
import { ConfigError, loadConfig } from './config';
import { drainOnSignals } from './core/http';
import { TASK_RUNNER, type TaskRunner } from './infra/tasks';

async function bootstrap(): Promise<void> {
  const cfg = loadConfig();
  if (isPrimaryOfMany(cfg.WEB_CONCURRENCY)) return runPrimary(cfg.WEB_CONCURRENCY);
  const app = await createApp(cfg);
  await app.listen(cfg.PORT, '0.0.0.0');
  const logger = new Logger('BenchProof');
  const runner = app.get<TaskRunner>(TASK_RUNNER);
  drainOnSignals(app, { graceMs: cfg.SHUTDOWN_GRACE_MS, stopTasks: (ms) => runner.stop?.(ms) ?? Promise.resolve(), log: (m) => logger.log(m) });
  logger.log(`Serving web and API on http://localhost:${cfg.PORT}`);
}

bootstrap().catch((e: unknown) => {
  // A configuration mistake gets its message alone, not a stack trace an operator has to read through.
  console.error(e instanceof ConfigError ? `BenchProof cannot start: ${e.message}` : e);
  process.exit(1);
});
