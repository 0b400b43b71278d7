import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnModuleInit } from '@nestjs/common';
import { SchedulerRegistry } from '@nestjs/schedule';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { removeLeftovers, UPLOAD_TEMP, type UploadTemp } from '../infra/storage';
import { TASK_RUNNER, type TaskRunner } from '../infra/tasks';
import { MediaTusService } from './media-tus.service';

/** A live upload or storage write touches its file every few seconds; half an hour idle means it is dead. */
const LIVE_WRITE_GRACE_MS = 30 * 60_000;
/** Finished task rows are kept a week for the screens and for debugging. */
const DONE_TASK_RETENTION_MS = 7 * 24 * 3600_000;

/**
 * Removes what crashes leave behind (issue: no leftovers after SIGKILL): at boot everything in
 * the multipart temp folder and every `*.partial`; then every STORAGE_SWEEP_MINUTES (an interval
 * of @nestjs/schedule, this process's own files) the same when idle for half an hour, plus tus
 * uploads unfinished after TUS_EXPIRE_HOURS and old finished task rows.
 * It never touches a stored original or derivative (see removeLeftovers).
 */
@Injectable()
export class MediaSweepService implements OnModuleInit, OnApplicationBootstrap {
  private readonly logger = new Logger('StorageSweep');
  private running: Promise<void> | null = null;

  constructor(
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    @Inject(UPLOAD_TEMP) private readonly temp: UploadTemp,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly tus: MediaTusService,
    private readonly schedule: SchedulerRegistry,
  ) {}

  /** Runs before the server listens and before the task runner starts, so nothing of ours is live. */
  async onModuleInit(): Promise<void> {
    const removed = await this.removeLeftovers(null);
    if (removed.length > 0) this.logger.log(`Removed ${removed.length} leftover file(s) at boot`);
  }

  /** Expires old tus uploads once the tus server is up (before the app answers), then every STORAGE_SWEEP_MINUTES. */
  async onApplicationBootstrap(): Promise<void> {
    await this.sweepOnce();
    const timer = setInterval(() => void this.sweepOnce(), this.cfg.STORAGE_SWEEP_MINUTES * 60_000);
    this.schedule.addInterval('storage-sweep', timer);
  }

  /** One sweep at a time; a tick that finds one running skips. */
  sweepOnce(): Promise<void> {
    this.running ??= this.sweep()
      .catch((err: unknown) => this.logger.error(`Sweep failed: ${(err as Error).message}`))
      .finally(() => (this.running = null));
    return this.running;
  }

  private async sweep(): Promise<void> {
    const now = this.clock.now();
    const removed = await this.removeLeftovers(new Date(now.getTime() - LIVE_WRITE_GRACE_MS));
    const expired = await this.tus.expireAbandoned();
    const pruned = this.tasks.prune?.(new Date(now.getTime() - DONE_TASK_RETENTION_MS)) ?? 0;
    if (removed.length + expired + pruned > 0)
      this.logger.log(`Sweep: ${removed.length} leftover file(s), ${expired} expired upload(s), ${pruned} old task row(s)`);
  }

  private removeLeftovers(olderThan: Date | null): Promise<string[]> {
    return removeLeftovers(this.cfg.UPLOADS_DIR, { multipart: this.temp.multipartDir, resumable: this.temp.resumableDir }, olderThan);
  }
}
