import { type BeforeApplicationShutdown, Global, Inject, Module, type OnApplicationBootstrap } from '@nestjs/common';
import { DiscoveryModule } from '@nestjs/core';
import { APP_CONFIG, type AppConfig } from '../../config';
import { DB, type Db } from '../../core/db';
import { CLOCK, type Clock } from '../../core/clock';
import { type MaybeRedis, REDIS } from '../redis';
import { BullMqTaskRunner } from './bullmq/bullmq-task-runner';
import { SqliteTaskRunner } from './sqlite-task-runner';
import { TaskHandlerRegistry } from './task-handler.registry';
import { TaskStore } from './task-store';
import { TASK_RUNNER } from './tasks.port';

/** What the module drives, whichever runner it is. */
type DrivenRunner = SqliteTaskRunner | BullMqTaskRunner;

function createRunner(db: Db, clock: Clock, cfg: AppConfig, redis: MaybeRedis): DrivenRunner {
  const opts = {
    pollMs: cfg.TASK_POLL_MS,
    leaseMs: cfg.TASK_LEASE_MS,
    backoff: { baseMs: cfg.TASK_BACKOFF_MS, maxMs: 10 * 60_000 },
    longBackoff: { baseMs: cfg.TASK_RETRY_LATER_MS, maxMs: 24 * 3600_000 },
    maxAttempts: 5,
  };
  if (cfg.TASKS_DRIVER === 'redis' && redis) return new BullMqTaskRunner(new TaskStore(db), redis, clock, opts, db);
  return new SqliteTaskRunner(new TaskStore(db), clock, opts);
}

/**
 * The runner behind TASK_RUNNER, chosen by TASKS (TASKS_DRIVER): SQLite in this process, or BullMQ
 * on Redis with the tasks table as the outbox. TaskHandlerRegistry registers every `@TaskHandler`
 * method at init; the runner starts taking work once the whole application has booted.
 */
@Global()
@Module({
  imports: [DiscoveryModule],
  providers: [
    TaskHandlerRegistry,
    {
      provide: TASK_RUNNER,
      inject: [DB, CLOCK, APP_CONFIG, REDIS],
      useFactory: createRunner,
    },
  ],
  exports: [TASK_RUNNER],
})
export class TasksModule implements OnApplicationBootstrap, BeforeApplicationShutdown {
  constructor(
    @Inject(TASK_RUNNER) private readonly runner: DrivenRunner,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  onApplicationBootstrap(): void {
    this.runner.start();
  }

  /** Before the database closes: take nothing new, finish what is running within the grace, release the rest. */
  async beforeApplicationShutdown(): Promise<void> {
    await this.runner.stop(this.cfg.SHUTDOWN_GRACE_MS);
  }
}
