import { PassThrough, type Writable } from 'node:stream';
import { buffer } from 'node:stream/consumers';
import { Inject, Injectable } from '@nestjs/common';
import { SHOWCASE_SIZES, type ShowcaseExportQuery, type ShowcaseZipRequest } from '@benchproof/contracts';
import { AnnotationRenderService } from '../annotations';
import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { IMAGE, type ImageAdapter } from '../infra/image';
import { STORAGE, type Storage } from '../infra/storage';
import { ShopsService } from '../shops';
import { ShowcaseService } from './showcase.service';

export interface ExportFile {
  name: string;
  data: Buffer;
}

/** The shop's mark on every file: its report logo when one is set, else its name. */
export interface Watermark {
  text: string;
  logo: Buffer | null;
}

/**
 * Showcase files. Every shot comes from the annotated render (blur boxes pixelated
 * into the pixels), gets the pair's crop, and is re-encoded by ImageAdapter.compose
 * with no metadata. Consent is checked again right before each file is handed out.
 */
@Injectable()
export class ShowcaseExportService {
  constructor(
    private readonly showcase: ShowcaseService,
    private readonly render: AnnotationRenderService,
    private readonly shops: ShopsService,
    private readonly audit: AuditService,
    @Inject(IMAGE) private readonly image: ImageAdapter,
    @Inject(STORAGE) private readonly storage: Storage,
  ) {}

  /** The logo is read once per request or zip, not per file. A logo file that cannot be read falls back to the name. */
  async watermark(shopId: number): Promise<Watermark> {
    const text = this.shops.settings(shopId).name;
    const logo = this.shops.logo(shopId);
    if (!logo) return { text, logo: null };
    return { text, logo: await buffer(this.storage.createReadStream(logo.key)).catch(() => null) };
  }

  /** One file, consent checked before rendering and again before it is returned. */
  async file(actor: AuthUser, pairId: number, q: ShowcaseExportQuery, mark?: Watermark): Promise<ExportFile> {
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
      watermark: mark ?? (await this.watermark(actor.shopId)),
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

  /** `signal` stops the zip between files and while it waits on the reader (a revocation, see ShowcaseExportTasks). */
  async writeZip(actor: AuthUser, req: ShowcaseZipRequest, out: Writable, progress: (f: number) => void, signal?: AbortSignal): Promise<void> {
    // The archive writer loads with the first export, not at boot.
    const { ZipFile } = await import('yazl');
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
      const mark = await this.watermark(actor.shopId);
      for (const [i, item] of req.items.entries()) {
        signal?.throwIfAborted();
        const f = await abortable(this.file(actor, item.pairId, item, mark), signal);
        zip.addBuffer(f.data, `${String(i + 1).padStart(3, '0')}-${f.name}`, { compress: false });
        added += f.data.length;
        // Back-pressure: the next file is made only once this one has gone out.
        while (sent < added && !out.destroyed) {
          signal?.throwIfAborted();
          await new Promise((r) => setTimeout(r, 5));
        }
        progress((i + 1) / req.items.length);
      }
      signal?.throwIfAborted();
      zip.end();
      await done;
    } catch (err) {
      zip.outputStream.unpipe();
      out.destroy(err as Error);
      throw err;
    }
  }
}

/** The work's result, or the signal's reason as soon as it aborts (a file still rendering is then dropped, unaudited). */
function abortable<T>(work: Promise<T>, signal?: AbortSignal): Promise<T> {
  if (!signal) return work;
  signal.throwIfAborted();
  return new Promise<T>((resolve, reject) => {
    const stop = () => reject(signal.reason as Error);
    signal.addEventListener('abort', stop, { once: true });
    work.then(resolve, reject).finally(() => signal.removeEventListener('abort', stop));
  });
}
