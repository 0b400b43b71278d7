import { PassThrough, Readable, type Writable } from 'node:stream';
import { Inject, Injectable, type OnModuleInit } from '@nestjs/common';
import { SHOWCASE_SIZES, type ShowcaseExportQuery, type ShowcaseExportTaskDto, type ShowcaseZipRequest } from '@benchproof/contracts';
import { ZipFile } from 'yazl';
import { AnnotationRenderService } from '../annotations';
import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { DomainError } from '../core/http';
import { IMAGE, type ImageAdapter } from '../infra/image';
import { STORAGE, type Storage } from '../infra/storage';
import { TASK_RUNNER, type TaskRunner } from '../infra/tasks';
import { ShopsService } from '../shops';
import { ShowcaseService } from './showcase.service';

export const EXPORT_TASK = 'showcase.export';
/** Selections above this many files run as a background task with progress. */
export const LARGE_EXPORT = 10;

export interface ExportFile {
  name: string;
  data: Buffer;
}

/**
 * Showcase files. Every shot comes from the annotated render (blur boxes pixelated
 * into the pixels), gets the pair's crop, and is re-encoded by ImageAdapter.compose
 * with no metadata. Consent is checked again right before each file is handed out.
 */
@Injectable()
export class ShowcaseExportService implements OnModuleInit {
  constructor(
    private readonly showcase: ShowcaseService,
    private readonly render: AnnotationRenderService,
    private readonly shops: ShopsService,
    private readonly audit: AuditService,
    @Inject(IMAGE) private readonly image: ImageAdapter,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
  ) {}

  onModuleInit(): void {
    this.tasks.register(EXPORT_TASK, async (t) => this.runTask(t.payload as unknown as TaskPayload, t.key, (f) => t.progress(f)), {
      concurrency: 1,
      maxAttempts: 1,
    });
  }

  /** One file, consent checked before rendering and again before it is returned. */
  async file(actor: AuthUser, pairId: number, q: ShowcaseExportQuery): Promise<ExportFile> {
    const { pair } = this.showcase.clear(actor, pairId);
    const size = SHOWCASE_SIZES[q.size];
    const ids = q.variant === 'pair' ? [pair.before.id, pair.after.id] : [q.variant === 'before' ? pair.before.id : pair.after.id];
    const shots = await Promise.all(ids.map((id) => this.render.annotatedJpeg(actor.shopId, id, 'print')));
    const layout = q.layout ?? (q.size === 'portrait' ? 'stacked' : 'side');
    const data = await this.image.compose({
      shots,
      crop: pair.crop,
      width: size.width,
      height: size.height,
      layout,
      labels: q.variant === 'pair' ? ['before', 'after'] : [],
      watermark: this.shops.settings(actor.shopId).name,
    });
    this.showcase.clear(actor, pairId);
    this.audit.record(actor, {
      action: 'showcase.exported',
      entityType: 'job',
      entityId: pair.jobId,
      details: { pairId, jobId: pair.jobId, variant: q.variant, size: q.size, layout, bytes: data.length },
    });
    return { name: `pair-${pairId}-${q.variant}-${q.size}.jpg`, data };
  }

  /**
   * Streams a zip of the selection into `out`. Every item is cleared before the first
   * byte (so a refusal is a clean error); then files are made one at a time and the next
   * waits until the previous one has left (memory stays at about one file). A revocation
   * mid-way destroys the stream: the partial zip has no central directory and will not open.
   */
  async streamZip(actor: AuthUser, req: ShowcaseZipRequest, out: Writable): Promise<void> {
    for (const item of req.items) this.showcase.clear(actor, item.pairId);
    await this.writeZip(actor, req, out, () => undefined);
  }

  async writeZip(actor: AuthUser, req: ShowcaseZipRequest, out: Writable, progress: (f: number) => void): Promise<void> {
    const zip = new ZipFile();
    let sent = 0;
    let added = 0;
    const counter = new PassThrough();
    counter.on('data', (c: Buffer) => (sent += c.length));
    zip.outputStream.pipe(counter).pipe(out);
    const done = new Promise<void>((resolve, reject) => {
      out.on('finish', resolve).on('close', resolve).on('error', reject);
    });
    done.catch(() => undefined); // a failure is reported by the throw below, not twice
    try {
      for (const [i, item] of req.items.entries()) {
        const f = await this.file(actor, item.pairId, item);
        zip.addBuffer(f.data, `${String(i + 1).padStart(3, '0')}-${f.name}`, { compress: false });
        added += f.data.length;
        // Back-pressure: the next file is made only once this one has gone out.
        while (sent < added && !out.destroyed) await new Promise((r) => setTimeout(r, 5));
        progress((i + 1) / req.items.length);
      }
      zip.end();
      await done;
    } catch (err) {
      zip.outputStream.unpipe();
      out.destroy(err as Error);
      throw err;
    }
  }

  /** A large selection: queued as a task; the zip lands in storage, made with progress. */
  start(actor: AuthUser, req: ShowcaseZipRequest): ShowcaseExportTaskDto {
    for (const item of req.items) this.showcase.clear(actor, item.pairId);
    const key = `${actor.id}-${Date.now().toString(36)}`;
    this.tasks.enqueue({
      kind: EXPORT_TASK,
      key,
      shopId: actor.shopId,
      payload: { actor: { id: actor.id, shopId: actor.shopId, role: actor.role, email: actor.email, name: actor.name }, req },
    });
    return this.status(actor, key);
  }

  status(actor: AuthUser, key: string): ShowcaseExportTaskDto {
    const s = key.startsWith(`${actor.id}-`) ? this.tasks.status(EXPORT_TASK, key) : null;
    if (!s) throw new DomainError('NOT_FOUND', 'No such export.');
    return { key, state: s.state, progress: s.progress, error: s.lastError };
  }

  /** The finished zip; every item's consent is checked again before a byte is sent. */
  async download(actor: AuthUser, key: string): Promise<Readable> {
    const s = this.status(actor, key);
    if (s.state !== 'done') throw new DomainError('NOT_FOUND', 'This export is not ready.');
    const chunks: Buffer[] = [];
    for await (const c of this.storage.createReadStream(listKey(key))) chunks.push(c as Buffer);
    const pairIds = JSON.parse(Buffer.concat(chunks).toString('utf8')) as number[];
    for (const id of pairIds) this.showcase.clear(actor, id);
    return this.storage.createReadStream(zipKey(key));
  }

  private async runTask(p: TaskPayload, key: string, progress: (f: number) => void): Promise<void> {
    const sink = new PassThrough();
    const stored = this.storage.put(zipKey(key), sink);
    await Promise.all([this.writeZip(p.actor, p.req, sink, progress), stored]);
    await this.storage.put(listKey(key), Readable.from(Buffer.from(JSON.stringify(p.req.items.map((i) => i.pairId)))));
  }
}

interface TaskPayload {
  actor: AuthUser;
  req: ShowcaseZipRequest;
}

const safe = (key: string) => key.toLowerCase().replace(/[^a-z0-9_-]/g, '-');
const zipKey = (key: string) => `showcase/export-${safe(key)}.zip`;
const listKey = (key: string) => `showcase/export-${safe(key)}.json`;
