import { PassThrough, Readable } from 'node:stream';
import { randomUUID } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { ERROR_CODES, type ShowcaseExportTaskDto, type ShowcaseZipRequest } from '@benchproof/contracts';
import type { AuthUser } from '../core/auth';
import { CLOCK, type Clock } from '../core/clock';
import { UnitOfWork } from '../core/db';
import { DomainError } from '../core/http';
import { STORAGE, type Storage } from '../infra/storage';
import { TASK_RUNNER, type TaskContext, TaskHandler, type TaskRunner } from '../infra/tasks';
import { UsersService } from '../users';
import { ShowcaseExportService } from './showcase-export.service';
import { type ShowcaseExportRow, ShowcaseExportsRepository } from './showcase-exports.repository';
import { ShowcaseService } from './showcase.service';

export const EXPORT_TASK = 'showcase.export' as const;

/** An export running in this process: which jobs it draws on, and how to stop it. */
interface InFlight {
  shopId: number;
  jobIds: Set<number>;
  abort: AbortController;
}

/**
 * Large selections as the background task `showcase.export`: the zip lands in storage, made
 * with progress. The `showcase_exports` row is what the screen reads: status, progress, and a
 * failure's error code as a column. A revocation stops a running export at once
 * (ShowcaseConsentListener calls `cancelFor`), not only at its next file.
 */
@Injectable()
export class ShowcaseExportTasks {
  private readonly inFlight = new Map<string, InFlight>();

  constructor(
    private readonly showcase: ShowcaseService,
    private readonly exports: ShowcaseExportService,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    private readonly users: UsersService,
    private readonly repo: ShowcaseExportsRepository,
    private readonly uow: UnitOfWork,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  start(actor: AuthUser, req: ShowcaseZipRequest): ShowcaseExportTaskDto {
    for (const item of req.items) this.showcase.clear(actor, item.pairId);
    const key = `${actor.id}-${randomUUID()}`;
    const now = this.clock.now();
    const pairIds = req.items.map((i) => i.pairId);
    this.uow.run((tx) => {
      this.repo.insert({ shopId: actor.shopId, userId: actor.id, key, request: req, pairIds, status: 'queued', createdAt: now, updatedAt: now }, tx);
      this.tasks.enqueue({ kind: EXPORT_TASK, key, shopId: actor.shopId, payload: { userId: actor.id, req } }, tx);
    });
    return this.status(actor, key);
  }

  /** Only the user who started an export sees it. */
  status(actor: AuthUser, key: string): ShowcaseExportTaskDto {
    return toDto(this.mine(actor, key));
  }

  private mine(actor: AuthUser, key: string): ShowcaseExportRow {
    this.showcase.assertOpen(actor);
    const row = this.repo.find(actor.shopId, key);
    if (!row || row.userId !== actor.id) throw new DomainError('NOT_FOUND', 'No such export.');
    return row;
  }

  /** The finished zip; every item's consent is checked again before a byte is sent. */
  async download(actor: AuthUser, key: string): Promise<Readable> {
    const row = this.mine(actor, key);
    if (row.status !== 'done') throw new DomainError('NOT_FOUND', 'This export is not ready.');
    if (!row.zipKey || !(await this.storage.stat(row.zipKey))) throw new DomainError('CONSENT_REVOKED', PURGED);
    for (const id of row.pairIds) this.showcase.clear(actor, id);
    return this.storage.createReadStream(row.zipKey);
  }

  /**
   * Once consent no longer covers the showcase (read after commit): stops every running export
   * that draws on this job, and deletes finished zips that hold its photos, rather than leaving
   * them in storage until the weekly sweep.
   */
  async cancelFor(shopId: number, jobId: number): Promise<void> {
    const problem = this.showcase.problemOf(shopId, jobId);
    if (!problem) return;
    for (const run of this.inFlight.values()) {
      if (run.shopId === shopId && run.jobIds.has(jobId)) run.abort.abort(new DomainError(problem, undefined, { jobId }));
    }
    for (const done of this.repo.stored(shopId)) {
      if (!done.zipKey || !this.showcase.jobsOf(shopId, done.pairIds).has(jobId)) continue;
      this.repo.update(shopId, done.key, { zipKey: null, updatedAt: this.clock.now() });
      await this.storage.delete(done.zipKey);
    }
  }

  /** Runs with the rights the user has now (a deactivated user's export fails FORBIDDEN). */
  @TaskHandler(EXPORT_TASK, { concurrency: 1, maxAttempts: 1 })
  async run(t: TaskContext<typeof EXPORT_TASK>): Promise<void> {
    const shopId = t.shopId ?? 0;
    const set = (patch: Parameters<ShowcaseExportsRepository['update']>[2]) => this.repo.update(shopId, t.key, { ...patch, updatedAt: this.clock.now() });
    try {
      set({ status: 'running', progress: 0 });
      await this.make(t, (f) => set({ progress: f }));
      set({ status: 'done', progress: 1, zipKey: zipKey(t.key) });
    } catch (err) {
      const known = err instanceof DomainError;
      set({ status: 'failed', errorCode: known ? err.code : 'INTERNAL', errorMessage: known ? err.message : ERROR_CODES.INTERNAL.message });
      throw err;
    }
  }

  private async make(t: TaskContext<typeof EXPORT_TASK>, progress: (f: number) => void): Promise<void> {
    const { userId, req } = t.payload;
    const actor = t.shopId === null ? null : this.users.identity(t.shopId, userId);
    if (!actor) throw new DomainError('FORBIDDEN', 'The person who started this export can no longer make one.');
    const pairIds = req.items.map((i) => i.pairId);
    const abort = new AbortController();
    this.inFlight.set(t.key, { shopId: actor.shopId, jobIds: this.showcase.jobsOf(actor.shopId, pairIds), abort });
    const sink = new PassThrough();
    const stored = this.storage.put(zipKey(t.key), sink);
    const written = this.exports.writeZip(actor, req, sink, progress, abort.signal);
    try {
      await Promise.all([written, stored]);
    } catch (err) {
      // The zip's own failure (e.g. CONSENT_REVOKED) rather than the storage's "stream destroyed" it caused.
      throw await written.then(
        () => err,
        (e: unknown) => e,
      );
    } finally {
      this.inFlight.delete(t.key);
    }
  }
}

const toDto = (r: ShowcaseExportRow): ShowcaseExportTaskDto => ({
  key: r.key,
  state: r.status,
  progress: r.progress,
  code: r.status === 'failed' ? (r.errorCode ?? 'INTERNAL') : null,
  error: r.status === 'failed' ? r.errorMessage : null,
});

const PURGED = 'A job in this export withdrew consent, so its zip was deleted. Make a new export without it.';
const safe = (key: string) => key.toLowerCase().replace(/[^a-z0-9_-]/g, '-');
const zipKey = (key: string) => `showcase/export-${safe(key)}.zip`;
