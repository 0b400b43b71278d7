import { Inject, Injectable, type OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { TASK_RUNNER, type TaskContext, TaskHandler, type TaskRunner } from '../infra/tasks';
import { MailDelivery } from './mail-delivery';
import { MailRepository } from './mail.repository';

export const MAIL_SEND = 'mail.send' as const;

/** The task key of one round of a message: a resend is a new round, so a settled task never blocks it. */
export const mailTaskKey = (row: { id: number; round: number }): string => `${row.id}.${row.round}`;

/**
 * The outbox relay. The outbox table, written in the cause's transaction, is the durable
 * record of what still has to go; the relay hands due rows to the task runner at boot and
 * every MAIL_SWEEP_MS, and owns the backoff (next_try_at), so desk sees one schedule.
 * The runner dedupes by (kind, key), so a row already queued there is not added twice.
 */
@Injectable()
export class MailRelay implements OnModuleInit, OnApplicationShutdown {
  private timer: NodeJS.Timeout | null = null;

  constructor(
    private readonly repo: MailRepository,
    private readonly delivery: MailDelivery,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  onModuleInit(): void {
    this.sweep();
    this.timer = setInterval(() => this.sweep(), this.cfg.MAIL_SWEEP_MS);
    this.timer.unref();
  }

  onApplicationShutdown(): void {
    if (this.timer) clearInterval(this.timer);
  }

  /** One attempt per task: the relay schedules retries, so a runner's own retries would only double them. */
  @TaskHandler(MAIL_SEND, { concurrency: 2, maxAttempts: 1 })
  deliver(task: TaskContext<typeof MAIL_SEND>): Promise<void> {
    return this.delivery.deliver(task);
  }

  /** Hands every due message to the runner. */
  sweep(): void {
    const now = this.clock.now();
    for (const row of this.repo.due(now, new Date(now.getTime() - this.cfg.MAIL_SEND_LEASE_MS))) {
      this.tasks.enqueue({ kind: MAIL_SEND, key: mailTaskKey(row), shopId: row.shopId });
    }
  }
}
