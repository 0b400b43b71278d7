import { Inject, Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { removeLeftovers, STORAGE, type Storage, UPLOAD_TEMP, type UploadTemp } from '../infra/storage';
import { TASK_RUNNER, TaskHandler, type TaskRunner } from '../infra/tasks';
import { MediaTusService } from './media-tus.service';
import { MediaRepository } from './media.repository';

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
    private readonly repo: MediaRepository,
    @Inject(STORAGE) private readonly storage: Storage,
  ) {}

  /** Runs before the server listens and before the task runner starts, so nothing of ours is live. */
  async onModuleInit(): Promise<void> {
    const removed = await this.removeLeftovers(null);
    if (removed.length > 0) this.logger.log(`Removed ${removed.length} leftover file(s) at boot`);
    // Expires old tus uploads once the tus server is up, then keeps the periodic chain going.
    this.tasks.enqueue({ kind: SWEEP_TASK, key: `boot-${this.clock.now().toISOString()}`, shopId: null });
  }

  /** One sweep now (the storage.sweep task's handler; tests call it too). */
  @TaskHandler(SWEEP_TASK, { concurrency: 1, maxAttempts: 3 })
  async sweep(): Promise<void> {
    const now = this.clock.now();
    const removed = await this.removeLeftovers(new Date(now.getTime() - LIVE_WRITE_GRACE_MS));
    const expired = (await this.tus.expireAbandoned()) + (await this.tus.removeUnreadable(new Date(now.getTime() - LIVE_WRITE_GRACE_MS)));
    const orphans = await this.removeOrphanOriginals(new Date(now.getTime() - this.cfg.ORPHAN_GRACE_MINUTES * 60_000));
    const pruned = this.tasks.prune?.(new Date(now.getTime() - DONE_TASK_RETENTION_MS)) ?? 0;
    if (removed.length + expired + orphans + pruned > 0)
      this.logger.log(`Sweep: ${removed.length} leftover file(s), ${expired} dead upload(s), ${orphans} original(s) with no row, ${pruned} old task row(s)`);
    this.scheduleNext(now);
  }

  /**
   * Originals that no media row names (the row's commit failed after the file was stored, and the
   * process died before removing it). Only files older than the grace period are candidates, and
   * the keys rows name are read after listing them, so a file whose row is committing is never taken.
   */
  private async removeOrphanOriginals(olderThan: Date): Promise<number> {
    if (!this.storage.listKeys) return 0;
    const candidates: string[] = [];
    for await (const f of this.storage.listKeys('originals/')) if (f.modifiedAt < olderThan) candidates.push(f.key);
    if (candidates.length === 0) return 0;
    const named = this.repo.originalKeys();
    const orphans = candidates.filter((k) => !named.has(k));
    for (const key of orphans) await this.storage.delete(key);
    return orphans.length;
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
