import { Inject, Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { removeLeftovers, UPLOAD_TEMP, type UploadTemp } from '../infra/storage';
import { TASK_RUNNER, TaskHandler, type TaskRunner } from '../infra/tasks';
import { MediaTusService } from './media-tus.service';

export const SWEEP_TASK = 'storage.sweep' as const;
/** A live upload or storage write touches its file every few seconds; half an hour idle means it is dead. */
const LIVE_WRITE_GRACE_MS = 30 * 60_000;
/** Finished task rows are kept a week for the screens and for debugging. */
const DONE_TASK_RETENTION_MS = 7 * 24 * 3600_000;

/**
 * Removes what crashes leave behind (issue: no leftovers after SIGKILL): at boot everything in
 * the multipart temp folder and every `*.partial`; then, as the periodic task 'storage.sweep',
 * the same when idle for half an hour, plus tus uploads unfinished after TUS_EXPIRE_HOURS.
 * It never touches a stored original or derivative (see removeLeftovers).
 */
@Injectable()
export class MediaSweepService implements OnModuleInit {
  private readonly logger = new Logger('StorageSweep');

  constructor(
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    @Inject(UPLOAD_TEMP) private readonly temp: UploadTemp,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly tus: MediaTusService,
  ) {}

  /** Runs before the server listens and before the task runner starts, so nothing of ours is live. */
  async onModuleInit(): Promise<void> {
    const removed = await this.removeLeftovers(null);
    if (removed.length > 0) this.logger.log(`Removed ${removed.length} leftover file(s) at boot`);
    // Expires old tus uploads once the tus server is up, then keeps the periodic chain going.
    this.tasks.enqueue({ kind: SWEEP_TASK, key: `boot-${this.clock.now().toISOString()}`, shopId: null });
  }

  @TaskHandler(SWEEP_TASK, { concurrency: 1, maxAttempts: 3 })
  async sweep(): Promise<void> {
    const now = this.clock.now();
    const removed = await this.removeLeftovers(new Date(now.getTime() - LIVE_WRITE_GRACE_MS));
    const expired = await this.tus.expireAbandoned();
    const pruned = this.tasks.prune?.(new Date(now.getTime() - DONE_TASK_RETENTION_MS)) ?? 0;
    if (removed.length + expired + pruned > 0)
      this.logger.log(`Sweep: ${removed.length} leftover file(s), ${expired} expired upload(s), ${pruned} old task row(s)`);
    this.scheduleNext(now);
  }

  /** One task per time slot: every chain (one per boot) converges on the same key, so they never pile up. */
  private scheduleNext(now: Date): void {
    const every = this.cfg.STORAGE_SWEEP_MINUTES * 60_000;
    const slot = Math.floor(now.getTime() / every) + 1;
    this.tasks.enqueue({ kind: SWEEP_TASK, key: `slot-${slot}`, shopId: null, runAt: new Date(slot * every) });
  }

  private removeLeftovers(olderThan: Date | null): Promise<string[]> {
    return removeLeftovers(this.cfg.UPLOADS_DIR, { multipart: this.temp.multipartDir, resumable: this.temp.resumableDir }, olderThan);
  }
}
