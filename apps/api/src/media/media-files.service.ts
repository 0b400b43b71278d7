import { Inject, Injectable } from '@nestjs/common';
import { roleCan, type MediaVariant } from '@benchproof/contracts';
import { buffer } from 'node:stream/consumers';
import type { AuthUser } from '../core/auth';
import { type FileToSend, notFound } from '../core/http';
import { STORAGE, type Storage } from '../infra/storage';
import { MediaFileCache } from './media-file-cache';
import { MediaRepository } from './media.repository';

/** What to send: the storage key, its SHA-256 (the ETag), type, and the size when the database knows it. */
interface FileRef {
  key: string;
  sha256: string;
  mime: string;
  bytes: number | null;
}

const EXT: Record<string, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'video/mp4': 'mp4',
  'video/quicktime': 'mov',
  'video/webm': 'webm',
};

/**
 * Answers for media bytes: only staff of the owning shop (404 for anyone else, as
 * if it did not exist), private caching, ETag = SHA-256 of the bytes, and single
 * byte ranges (RFC 9110 §14) so a phone can seek in a video.
 */
@Injectable()
export class MediaFilesService {
  constructor(
    private readonly repo: MediaRepository,
    @Inject(STORAGE) private readonly storage: Storage,
    private readonly cache: MediaFileCache,
  ) {}

  async open(actor: AuthUser, id: number, variant: MediaVariant | 'original'): Promise<FileToSend> {
    return this.describe(this.locate(actor, id, variant), id, variant);
  }

  /**
   * A screen-sized derivative of a live asset of this job, for the owner page:
   * never the original, never another job's media.
   */
  async openDerivativeOfJob(scope: { shopId: number; jobId: number }, id: number, variant: 'thumb' | 'screen'): Promise<FileToSend> {
    const row = this.repo.findFile(scope.shopId, id, variant);
    if (!row || row.jobId !== scope.jobId || row.deletedAt || row.purgedAt) throw notFound('Media');
    const d =
      row.derivativeKey && row.derivativeSha256
        ? { key: row.derivativeKey, sha256: row.derivativeSha256, bytes: row.derivativeBytes }
        : this.repo.findDerivative(row.id, 'poster');
    if (!d) throw notFound('Media variant');
    return this.describe({ key: d.key, sha256: d.sha256, mime: 'image/jpeg', bytes: d.bytes }, id, variant);
  }

  /** Private caching, ETag = SHA-256 of the bytes; small derivatives come from the in-memory cache. */
  private async describe(file: FileRef, id: number, variant: string): Promise<FileToSend> {
    const cached = file.bytes !== null && this.cache.fits(file.bytes);
    const size = file.bytes ?? (await this.storage.stat(file.key))?.bytes;
    if (size === undefined) throw notFound('Media file');
    return {
      size,
      etag: `"${file.sha256}"`,
      contentType: file.mime,
      cacheControl: 'private, max-age=3600',
      disposition: `inline; filename="media-${id}-${variant}.${EXT[file.mime] ?? 'bin'}"`,
      open: async (range) => {
        if (!cached) return this.storage.createReadStream(file.key, range);
        const data = await this.cache.get(file.key, file.sha256, size, () => this.readAll(file.key));
        return range ? data.subarray(range.start, range.end + 1) : data;
      },
    };
  }

  private async readAll(key: string): Promise<Buffer> {
    try {
      return await buffer(this.storage.createReadStream(key));
    } catch {
      throw notFound('Media file');
    }
  }

  private locate(actor: AuthUser, id: number, variant: MediaVariant | 'original'): FileRef {
    const row = this.repo.findFile(actor.shopId, id, variant);
    const hidden = !row || row.purgedAt || (row.deletedAt && !roleCan(actor.role, 'media.view_deleted'));
    if (!row || hidden || !row.originalKey) throw notFound('Media');
    if (variant === 'original') return { key: row.originalKey, sha256: row.sha256, mime: row.mime, bytes: null };
    if (!row.derivativeKey || !row.derivativeSha256) throw notFound('Media variant');
    return { key: row.derivativeKey, sha256: row.derivativeSha256, mime: 'image/jpeg', bytes: row.derivativeBytes };
  }
}
