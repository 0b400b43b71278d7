import { PassThrough, Readable } from 'node:stream';
import { buffer } from 'node:stream/consumers';
import { randomUUID } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { ERROR_CODES, type ErrorCode, type ShowcaseExportTaskDto, type ShowcaseZipRequest } from '@benchproof/contracts';
import type { AuthUser } from '../core/auth';
import { DomainError } from '../core/http';
import { STORAGE, type Storage } from '../infra/storage';
import { TASK_RUNNER, type TaskContext, TaskHandler, type TaskRunner } from '../infra/tasks';
import { UsersService } from '../users';
import { ShowcaseExportService } from './showcase-export.service';
import { ShowcaseService } from './showcase.service';

export const EXPORT_TASK = 'showcase.export' as const;

/** An export running in this process: which jobs it draws on, and how to stop it. */
interface InFlight {
  shopId: number;
  jobIds: Set<number>;
  abort: AbortController;
}

/**
 * Large selections as the background task `showcase.export`: the zip lands in storage,
 * made with progress. A failure keeps its error code in the task's last error
 * ("CODE: message"), so the screen can switch on it. A revocation stops a running
 * export at once (ShowcaseConsentListener calls `cancelFor`), not only at its next file.
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
  ) {}

  start(actor: AuthUser, req: ShowcaseZipRequest): ShowcaseExportTaskDto {
    for (const item of req.items) this.showcase.clear(actor, item.pairId);
    const key = `${actor.id}-${randomUUID()}`;
    this.tasks.enqueue({ kind: EXPORT_TASK, key, shopId: actor.shopId, payload: { userId: actor.id, req } });
    return this.status(actor, key);
  }

  /** Only the user who started an export sees it. */
  status(actor: AuthUser, key: string): ShowcaseExportTaskDto {
    this.showcase.assertOpen(actor);
    const s = key.startsWith(`${actor.id}-`) ? this.tasks.status(EXPORT_TASK, key) : null;
    if (!s) throw new DomainError('NOT_FOUND', 'No such export.');
    const failure = s.state === 'failed' ? readFailure(s.lastError) : null;
    return { key, state: s.state, progress: s.progress, code: failure?.code ?? null, error: failure?.message ?? null };
  }

  /** The finished zip; every item's consent is checked again before a byte is sent. */
  async download(actor: AuthUser, key: string): Promise<Readable> {
    const s = this.status(actor, key);
    if (s.state !== 'done') throw new DomainError('NOT_FOUND', 'This export is not ready.');
    if (!(await this.storage.stat(listKey(key)))) throw new DomainError('CONSENT_REVOKED', PURGED);
    const pairIds = JSON.parse((await buffer(this.storage.createReadStream(listKey(key)))).toString('utf8')) as number[];
    for (const id of pairIds) this.showcase.clear(actor, id);
    return this.storage.createReadStream(zipKey(key));
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
    for (const done of this.tasks.finished(EXPORT_TASK, shopId)) {
      const pairIds = done.payload.req.items.map((i) => i.pairId);
      if (!this.showcase.jobsOf(shopId, pairIds).has(jobId)) continue;
      await this.storage.delete(listKey(done.key));
      await this.storage.delete(zipKey(done.key));
    }
  }

  /** Runs with the rights the user has now (a deactivated user's export fails FORBIDDEN). */
  @TaskHandler(EXPORT_TASK, { concurrency: 1, maxAttempts: 1 })
  async run(t: TaskContext<typeof EXPORT_TASK>): Promise<void> {
    const { userId, req } = t.payload;
    const actor = t.shopId === null ? null : this.users.identity(t.shopId, userId);
    if (!actor) throw new Error('FORBIDDEN: The person who started this export can no longer make one.');
    const pairIds = req.items.map((i) => i.pairId);
    const abort = new AbortController();
    this.inFlight.set(t.key, { shopId: actor.shopId, jobIds: this.showcase.jobsOf(actor.shopId, pairIds), abort });
    const sink = new PassThrough();
    const stored = this.storage.put(zipKey(t.key), sink);
    const written = this.exports.writeZip(actor, req, sink, (f) => t.progress(f), abort.signal);
    try {
      await Promise.all([written, stored]);
      await this.storage.put(listKey(t.key), Readable.from(Buffer.from(JSON.stringify(pairIds))));
    } catch (err) {
      // The zip's own failure (e.g. CONSENT_REVOKED) rather than the storage's "stream destroyed" it caused.
      const cause: unknown = await written.then(
        () => err,
        (e: unknown) => e,
      );
      // The runner keeps only a message: the code goes in front of it for status() to read back.
      throw cause instanceof DomainError ? new Error(`${cause.code}: ${cause.message}`) : cause;
    } finally {
      this.inFlight.delete(t.key);
    }
  }
}

/** "CODE: message" as written by run(); anything else (a crash) is INTERNAL with its default message. */
function readFailure(lastError: string | null): { code: ErrorCode; message: string } {
  const m = /^([A-Z_]+): ([\s\S]*)$/.exec(lastError ?? '');
  if (m && m[1] in ERROR_CODES) return { code: m[1] as ErrorCode, message: m[2] };
  return { code: 'INTERNAL', message: ERROR_CODES.INTERNAL.message };
}

const PURGED = 'A job in this export withdrew consent, so its zip was deleted. Make a new export without it.';
const safe = (key: string) => key.toLowerCase().replace(/[^a-z0-9_-]/g, '-');
const zipKey = (key: string) => `showcase/export-${safe(key)}.zip`;
const listKey = (key: string) => `showcase/export-${safe(key)}.json`;
