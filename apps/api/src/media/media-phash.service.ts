import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { PAIRABLE_KINDS, perceptualHash } from '@benchproof/domain';
import { buffer } from 'node:stream/consumers';
import { IMAGE, type ImageAdapter } from '../infra/image';
import { STORAGE, type Storage } from '../infra/storage';
import { TASK_RUNNER, type TaskContext, TaskHandler, type TaskRunner } from '../infra/tasks';
import { MediaRepository, type MediaAssetRow } from './media.repository';

export const PHASH_TASK = 'media.phash' as const;

/**
 * Computes the perceptual hash of a still once its derivatives exist, for pair
 * suggestions. Hashes the upright screen derivative (the original may be turned by
 * EXIF and is larger to decode). Idempotent: an asset that has a hash is skipped.
 */
@Injectable()
export class MediaPhashService implements OnApplicationBootstrap {
  private readonly logger = new Logger('MediaPhash');

  constructor(
    private readonly repo: MediaRepository,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(IMAGE) private readonly image: ImageAdapter,
  ) {}

  /** Assets hashed before this feature existed, or whose task was lost in a crash. */
  onApplicationBootstrap(): void {
    for (const row of this.repo.listMissingPhash()) this.enqueue(row);
  }

  /** Schedules the hash of a still whose derivatives are ready; other kinds are ignored. */
  enqueue(row: Pick<MediaAssetRow, 'id' | 'shopId' | 'kind'>): void {
    if (!PAIRABLE_KINDS.includes(row.kind)) return;
    this.tasks.enqueue({ kind: PHASH_TASK, key: String(row.id), shopId: row.shopId });
  }

  @TaskHandler(PHASH_TASK, { concurrency: 1, maxAttempts: 3 })
  async run(task: TaskContext<typeof PHASH_TASK>): Promise<void> {
    const row = this.repo.findById(Number(task.key));
    if (!row || row.phash || row.purgedAt || row.derivativeStatus !== 'ready') return;
    const screen = this.repo.findDerivative(row.id, 'screen');
    if (!screen) {
      this.logger.warn(`Asset ${row.id} has no screen derivative to hash`);
      return;
    }
    const grid = await this.image.hashGrid(await buffer(this.storage.createReadStream(screen.key)));
    this.repo.update(row.id, { phash: perceptualHash(grid) });
  }
}
