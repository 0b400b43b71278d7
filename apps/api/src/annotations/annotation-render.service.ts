import { Inject, Injectable } from '@nestjs/common';
import { blurRegions, renderSvg, type AnnotationDocument } from '@benchproof/annotation';
import type { AnnotatedSize } from '@benchproof/contracts';
import { Readable } from 'node:stream';
import { IMAGE, type ImageAdapter } from '../infra/image';
import { STORAGE, type Storage } from '../infra/storage';
import { TASK_RUNNER, type TaskContext, TaskHandler, type TaskRunner } from '../infra/tasks';
import { MediaService } from '../media';
import { AnnotationsRepository } from './annotations.repository';

export const RENDER_TASK = 'annotation.render' as const;

/** Where an annotated (or, without annotation, plain) JPEG of an asset lives. */
export interface AnnotatedImage {
  key: string;
  /** 0 when the photo has no annotation and this is the plain derivative. */
  version: number;
  width: number;
  height: number;
}

/**
 * Burns an asset's annotation into its upright derivative: blur boxes pixelated in
 * the pixels themselves, then the lib's SVG composited on top. Cached in storage
 * per (asset, version, size); a version is immutable, so the cache never goes stale.
 */
@Injectable()
export class AnnotationRenderService {
  private readonly inFlight = new Map<string, Promise<void>>();

  constructor(
    private readonly repo: AnnotationsRepository,
    private readonly media: MediaService,
    @Inject(IMAGE) private readonly image: ImageAdapter,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
  ) {}

  @TaskHandler(RENDER_TASK, { concurrency: 1 })
  async prerender(t: TaskContext<typeof RENDER_TASK>): Promise<void> {
    if (t.shopId === null) return;
    for (const size of ['screen', 'print'] as const) await this.annotated(t.shopId, t.payload.assetId, size);
  }

  /** Renders a saved version ahead of the first request (report, owner page). */
  enqueue(shopId: number, assetId: number, version: number): void {
    this.tasks.enqueue({ kind: RENDER_TASK, key: `${assetId}:v${version}`, shopId, payload: { assetId, version } });
  }

  /** The storage key of the annotated JPEG at `size`, rendering it once if needed. */
  async annotated(shopId: number, assetId: number, size: AnnotatedSize): Promise<AnnotatedImage> {
    const base = this.media.uprightImage(shopId, assetId, size, { includeDeleted: true });
    const latest = this.repo.latest(shopId, assetId);
    if (!latest) return { key: base.key, version: 0, width: base.width, height: base.height };
    const key = `annotated/a${assetId}-v${latest.version}-${size}.jpg`;
    if (!(await this.storage.stat(key))) {
      // One render per key at a time, however many requests arrive together.
      let job = this.inFlight.get(key);
      if (!job) {
        job = this.render(base.key, base, latest.document, key).finally(() => this.inFlight.delete(key));
        this.inFlight.set(key, job);
      }
      await job;
    }
    return { key, version: latest.version, width: base.width, height: base.height };
  }

  /** The annotated JPEG bytes (for the report PDF, the owner page, the showcase). */
  async annotatedJpeg(shopId: number, assetId: number, size: AnnotatedSize): Promise<Buffer> {
    return (await this.annotatedWithBytes(shopId, assetId, size)).data;
  }

  /** The annotated JPEG with its pixel size, from one lookup. */
  async annotatedWithBytes(shopId: number, assetId: number, size: AnnotatedSize): Promise<AnnotatedImage & { data: Buffer }> {
    const img = await this.annotated(shopId, assetId, size);
    return { ...img, data: await readAll(this.storage.createReadStream(img.key)) };
  }

  private async render(baseKey: string, size: { width: number; height: number }, doc: AnnotationDocument, key: string): Promise<void> {
    const pixels = await readAll(this.storage.createReadStream(baseKey));
    const out = await this.image.annotate(pixels, renderSvg(doc, size), blurRegions(doc, size));
    if (await this.storage.stat(key)) return;
    await this.storage.put(key, Readable.from(out));
  }
}

async function readAll(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const c of stream) chunks.push(c as Buffer);
  return Buffer.concat(chunks);
}
