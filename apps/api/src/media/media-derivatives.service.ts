import { Inject, Injectable, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import type { MediaVariant } from '@benchproof/contracts';
import { randomUUID } from 'node:crypto';
import { Readable } from 'node:stream';
import { buffer } from 'node:stream/consumers';
import { DERIVATIVE_SIZES, IMAGE, type ImageAdapter, type Rendition, type SizedVariant } from '../infra/image';
import { TASK_QUEUE, type TaskQueue } from '../infra/queue';
import { STORAGE, type Storage } from '../infra/storage';
import { MediaPhashService } from './media-phash.service';
import { MediaRepository, type MediaAssetRow } from './media.repository';

const IMAGE_VARIANTS: SizedVariant[] = ['thumb', 'screen', 'print'];

/**
 * Makes the thumb/screen/print JPEGs of an image asset in the background and flips
 * its status pending → ready or failed. Keyed by asset id, so enqueueing twice is
 * harmless; assets left pending by a crash are picked up again at boot.
 */
@Injectable()
export class MediaDerivativesService implements OnApplicationBootstrap, OnApplicationShutdown {
  constructor(
    private readonly repo: MediaRepository,
    @Inject(TASK_QUEUE) private readonly queue: TaskQueue,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(IMAGE) private readonly image: ImageAdapter,
    private readonly phash: MediaPhashService,
  ) {}

  onApplicationBootstrap(): void {
    for (const row of this.repo.listPending()) this.enqueue(row.id);
  }

  /** Lets queued work finish before the database closes. */
  async onApplicationShutdown(): Promise<void> {
    await this.queue.drain();
  }

  enqueue(assetId: number): void {
    this.queue.enqueue(`derivatives:${assetId}`, () => this.make(assetId));
  }

  /** Resolves when no derivative work is queued or running. */
  settled(): Promise<void> {
    return this.queue.drain();
  }

  private async make(assetId: number): Promise<void> {
    const row = this.repo.findById(assetId);
    if (!row || row.derivativeStatus !== 'pending' || !row.originalKey) return;
    try {
      const original = await buffer(this.storage.createReadStream(row.originalKey));
      for (const variant of IMAGE_VARIANTS) {
        await this.save(row, variant, await this.image.rendition(original, DERIVATIVE_SIZES[variant]));
      }
      this.repo.update(assetId, { derivativeStatus: 'ready', derivativeError: null });
      this.phash.enqueue(row);
    } catch (err) {
      this.repo.update(assetId, { derivativeStatus: 'failed', derivativeError: (err as Error).message.slice(0, 500) });
    }
  }

  /**
   * A video's poster frame, captured by the browser from the <video> element (there is
   * no server-side decoder): stored as the poster and thumb derivatives, metadata-free.
   */
  async savePoster(row: MediaAssetRow, framePath: string): Promise<void> {
    await this.save(row, 'poster', await this.image.rendition(framePath, DERIVATIVE_SIZES.screen));
    await this.save(row, 'thumb', await this.image.rendition(framePath, DERIVATIVE_SIZES.thumb));
  }

  private async save(row: MediaAssetRow, variant: MediaVariant, out: Rendition): Promise<void> {
    const previous = this.repo.findDerivative(row.id, variant);
    const key = `derivatives/${row.shopId}/${randomUUID()}.jpg`;
    const stored = await this.storage.put(key, Readable.from([out.data]));
    this.repo.upsertDerivative({ assetId: row.id, variant, key, width: out.width, height: out.height, bytes: stored.bytes, sha256: stored.sha256 });
    if (previous) await this.storage.delete(previous.key);
  }

  async removeFiles(row: MediaAssetRow): Promise<void> {
    for (const d of this.repo.derivativesOf([row.id])) await this.storage.delete(d.key);
    if (row.originalKey) await this.storage.delete(row.originalKey);
  }
}
