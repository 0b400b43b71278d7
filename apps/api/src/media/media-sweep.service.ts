import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnModuleInit } from '@nestjs/common';
import { SchedulerRegistry } from '@nestjs/schedule';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { TICK_GATE, type TickGate } from '../core/schedule';
import { removeLeftovers, STORAGE, type Storage, UPLOAD_TEMP, type UploadTemp } from '../infra/storage';
import { TASK_RUNNER, type TaskRunner } from '../infra/tasks';
import { MediaTusService } from './media-tus.service';
import { MediaRepository } from './media.repository';

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
    private readonly repo: MediaRepository,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(TICK_GATE) private readonly gate: TickGate,
  ) {}

  /**
   * Runs before the server listens and before the task runner starts, so nothing of ours is live. With several
   * API processes (WEB_CONCURRENCY) a sibling may be writing, so only files idle past the grace go.
   */
  async onModuleInit(): Promise<void> {
    const removed = await this.removeLeftovers(this.cfg.WEB_CONCURRENCY > 1 ? new Date(this.clock.now().getTime() - LIVE_WRITE_GRACE_MS) : null);
    if (removed.length > 0) this.logger.log(`Removed ${removed.length} leftover file(s) at boot`);
  }

  /**
   * Expires old tus uploads once the tus server is up (before the app answers), then every STORAGE_SWEEP_MINUTES;
   * with several processes only the one that wins the tick (TICK_GATE) sweeps, so siblings starting together sweep once.
   */
  async onApplicationBootstrap(): Promise<void> {
    await this.tick();
    const timer = setInterval(() => void this.tick(), this.periodMs());
    this.schedule.addInterval('storage-sweep', timer);
  }

  /** A scheduled sweep: this process's, or skipped when another process has this period's. */
  async tick(): Promise<boolean> {
    if (!(await this.gate.claim('storage-sweep', this.periodMs()))) return false;
    await this.sweep();
    return true;
  }

  private periodMs(): number {
    return this.cfg.STORAGE_SWEEP_MINUTES * 60_000;
  }

  /** One sweep now, or the one already running (the interval's tick; tests call it too). */
  sweep(): Promise<void> {
    this.running ??= this.sweepNow()
      .catch((err: unknown) => this.logger.error(`Sweep failed: ${(err as Error).message}`))
      .finally(() => (this.running = null));
    return this.running;
  }

  private async sweepNow(): Promise<void> {
    const now = this.clock.now();
    const removed = await this.removeLeftovers(new Date(now.getTime() - LIVE_WRITE_GRACE_MS));
    const expired = (await this.tus.expireAbandoned()) + (await this.tus.removeUnreadable(new Date(now.getTime() - LIVE_WRITE_GRACE_MS)));
    const orphans = await this.removeOrphanOriginals(new Date(now.getTime() - this.cfg.ORPHAN_GRACE_MINUTES * 60_000));
    const pruned = this.tasks.prune?.(new Date(now.getTime() - DONE_TASK_RETENTION_MS)) ?? 0;
    if (removed.length + expired + orphans + pruned > 0)
      this.logger.log(`Sweep: ${removed.length} leftover file(s), ${expired} dead upload(s), ${orphans} original(s) with no row, ${pruned} old task row(s)`);
  }

  /**
   * Originals that no media row names (the row's commit failed after the file was stored, and the
   * process died before removing it). Only files older than the grace period are candidates, and
   * the keys rows name are read after listing them, so a file whose row is committing is never taken.
   */
  private async removeOrphanOriginals(olderThan: Date): Promise<number> {
    const candidates: string[] = [];
    for (const f of await this.storage.list('originals/')) if (f.modifiedAt < olderThan) candidates.push(f.key);
    if (candidates.length === 0) return 0;
    const named = this.repo.originalKeys();
    const orphans = candidates.filter((k) => !named.has(k));
    for (const key of orphans) await this.storage.delete(key);
    return orphans.length;
  }

  private removeLeftovers(olderThan: Date | null): Promise<string[]> {
    return removeLeftovers(this.cfg.UPLOADS_DIR, { multipart: this.temp.multipartDir, resumable: this.temp.resumableDir }, olderThan);
  }
}
