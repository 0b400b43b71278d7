import { Inject, Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import type { BackupList, BackupSummary } from '@benchproof/contracts';
import { dirname } from 'node:path';
import { AuditService } from '../audit';
import { APP_CONFIG, type AppConfig } from '../config';
import type { AuthUser } from '../core/auth';
import type Database from 'better-sqlite3';
import { SQLITE } from '../core/db';
import { listBackups, pruneBackups, writeBackup, type BackupManifest } from '../infra/backup';
import { CLOCK, type Clock } from '../core/clock';
import { STORAGE, type Storage } from '../infra/storage';
import { TASK_RUNNER, TaskHandler, type TaskRunner } from '../infra/tasks';

export const BACKUP_TASK = 'backup.run' as const;

/**
 * Database backups into the configured storage: every BACKUP_EVERY_HOURS as the task 'backup.run'
 * (one per time slot, like the storage sweep) and on demand from the manager screen or
 * `npm run backup`. Each run then keeps the newest BACKUP_KEEP.
 */
@Injectable()
export class BackupsService implements OnModuleInit {
  private readonly logger = new Logger('Backups');
  private running: Promise<BackupManifest> | null = null;

  constructor(
    @Inject(SQLITE) private readonly opened: { sqlite: Database.Database },
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly audit: AuditService,
  ) {}

  onModuleInit(): void {
    this.scheduleNext(this.clock.now());
  }

  async list(): Promise<BackupList> {
    return { backups: await listBackups(this.storage), keep: this.cfg.BACKUP_KEEP, everyHours: this.cfg.BACKUP_EVERY_HOURS, storage: this.cfg.STORAGE };
  }

  /** A backup now; a second request while one runs waits for that one instead of starting another. */
  async runNow(actor: AuthUser): Promise<BackupSummary> {
    const m = await this.run();
    this.audit.record(actor, { action: 'backup.created', entityType: 'backup', details: { id: m.id, databaseBytes: m.database.bytes, files: m.files.length } });
    return {
      id: m.id,
      createdAt: m.createdAt,
      databaseBytes: m.database.bytes,
      files: m.files.length,
      fileBytes: m.files.reduce((s, f) => s + (f.bytes ?? 0), 0),
    };
  }

  private run(): Promise<BackupManifest> {
    this.running ??= this.backupAndPrune().finally(() => (this.running = null));
    return this.running;
  }

  private async backupAndPrune(): Promise<BackupManifest> {
    const manifest = await writeBackup(this.opened.sqlite, this.storage, this.clock.now(), dirname(this.cfg.DATABASE_PATH));
    const dropped = await pruneBackups(this.storage, this.cfg.BACKUP_KEEP);
    this.logger.log(`Backup ${manifest.id}: ${manifest.database.bytes} bytes, ${manifest.files.length} files referred to; ${dropped.length} old removed`);
    return manifest;
  }

  @TaskHandler(BACKUP_TASK, { concurrency: 1, maxAttempts: 3 })
  async scheduled(): Promise<void> {
    await this.run();
    this.scheduleNext(this.clock.now());
  }

  /** One task per time slot: every chain (one per boot) converges on the same key. */
  private scheduleNext(now: Date): void {
    if (this.cfg.BACKUP_EVERY_HOURS <= 0) return;
    const every = this.cfg.BACKUP_EVERY_HOURS * 3600_000;
    const slot = Math.floor(now.getTime() / every) + 1;
    this.tasks.enqueue({ kind: BACKUP_TASK, key: `slot-${slot}`, shopId: null, runAt: new Date(slot * every) });
  }
}
