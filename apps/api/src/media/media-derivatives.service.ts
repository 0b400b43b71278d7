import { Inject, Injectable, type OnApplicationBootstrap } from '@nestjs/common';
import type { MediaVariant } from '@benchproof/contracts';
import { Readable } from 'node:stream';
import { buffer } from 'node:stream/consumers';
import { APP_CONFIG, type AppConfig } from '../config';
import { DERIVATIVE_SIZES, IMAGE, type ImageAdapter, type Rendition, type SizedVariant } from '../infra/image';
import { STORAGE, type Storage } from '../infra/storage';
import type { DbTx } from '../core/db';
import { TASK_RUNNER, type TaskContext, TaskHandler, type TaskRunner } from '../infra/tasks';
import { MediaFileCache } from './media-file-cache';
import { MediaPhashService } from './media-phash.service';
import { MediaRepository, type MediaAssetRow } from './media.repository';

const IMAGE_VARIANTS: SizedVariant[] = ['thumb', 'screen', 'print'];

export const DERIVATIVES_TASK = 'media.derivatives' as const;
const DERIVATIVES_MAX_ATTEMPTS = 3;

/** One file per (asset, variant): a re-run after a crash overwrites instead of adding a file. */
export const derivativeKey = (row: Pick<MediaAssetRow, 'id' | 'shopId'>, variant: MediaVariant) => `derivatives/${row.shopId}/${row.id}-${variant}.jpg`;

/**
 * Makes the thumb/screen/print JPEGs of an image asset as a durable task ('media.derivatives',
 * keyed by asset id) and flips its status pending → ready, or failed after the last attempt.
 */
@Injectable()
export class MediaDerivativesService implements OnApplicationBootstrap {
  constructor(
    private readonly repo: MediaRepository,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(IMAGE) private readonly image: ImageAdapter,
    private readonly phash: MediaPhashService,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    private readonly fileCache: MediaFileCache,
  ) {}

  /** Assets stored before the durable runner existed have no task row; give them one. */
  onApplicationBootstrap(): void {
    for (const row of this.repo.listPending()) this.enqueue(row);
  }

  /** Pass the transaction that stores the asset, so the task commits (or vanishes) with it. */
  enqueue(row: Pick<MediaAssetRow, 'id' | 'shopId'>, tx?: DbTx): void {
    this.tasks.enqueue({ kind: DERIVATIVES_TASK, key: String(row.id), shopId: row.shopId }, tx);
  }

  /** Resolves when no background work is queued or running. */
  settled(): Promise<void> {
    return this.tasks.settled();
  }

  @TaskHandler(DERIVATIVES_TASK, { concurrency: (cfg) => cfg.DERIVATIVES_CONCURRENCY, maxAttempts: DERIVATIVES_MAX_ATTEMPTS })
  async make(task: TaskContext<typeof DERIVATIVES_TASK>): Promise<void> {
    const assetId = Number(task.key);
    const row = this.repo.findById(assetId);
    if (!row || row.derivativeStatus !== 'pending' || !row.originalKey) return;
    try {
      const original = await buffer(this.storage.createReadStream(row.originalKey));
      const made = await this.image.renditions(
        original,
        IMAGE_VARIANTS.map((v) => DERIVATIVE_SIZES[v]),
      );
      // The three writes (each hashed on its way to disk) go out together; none depends on another.
      let saved = 0;
      await Promise.all(
        IMAGE_VARIANTS.map(async (variant, i) => {
          await this.save(row, variant, made[i]);
          task.progress(++saved / IMAGE_VARIANTS.length);
        }),
      );
      this.repo.update(assetId, { derivativeStatus: 'ready', derivativeError: null });
      this.phash.enqueue(row);
    } catch (err) {
      if (task.attempt >= DERIVATIVES_MAX_ATTEMPTS)
        this.repo.update(assetId, { derivativeStatus: 'failed', derivativeError: (err as Error).message.slice(0, 500) });
      throw err;
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
    const key = derivativeKey(row, variant);
    const stored = await this.storage.put(key, Readable.from([out.data]));
    this.repo.upsertDerivative({ assetId: row.id, variant, key, width: out.width, height: out.height, bytes: stored.bytes, sha256: stored.sha256 });
    // Rows written before keys were deterministic point at a random name.
    if (previous && previous.key !== key) await this.deleteFile(previous.key);
  }

  async removeFiles(row: MediaAssetRow): Promise<void> {
    for (const d of this.repo.derivativesOf([row.id])) await this.deleteFile(d.key);
    if (row.originalKey) await this.storage.delete(row.originalKey);
  }

  private async deleteFile(key: string): Promise<void> {
    this.fileCache.forget(key);
    await this.storage.delete(key);
  }
}
