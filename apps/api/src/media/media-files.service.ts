import { Inject, Injectable } from '@nestjs/common';
import { roleCan, type MediaVariant } from '@benchproof/contracts';
import type { Readable } from 'node:stream';
import type { AuthUser } from '../core/auth';
import { notFound } from '../core/http';
import { STORAGE, type Storage } from '../infra/storage';
import { parseRange } from './byte-range';
import { MediaRepository } from './media.repository';

export interface FileReply {
  status: 200 | 206 | 304 | 416;
  headers: Record<string, string>;
  body: Readable | null;
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
  ) {}

  async open(actor: AuthUser, id: number, variant: MediaVariant | 'original', req: { range?: string; ifNoneMatch?: string }): Promise<FileReply> {
    return this.serve(this.locate(actor, id, variant), id, variant, req);
  }

  /**
   * A screen-sized derivative of a live asset of this job, for the owner page:
   * never the original, never another job's media.
   */
  async openDerivativeOfJob(
    scope: { shopId: number; jobId: number },
    id: number,
    variant: 'thumb' | 'screen',
    req: { range?: string; ifNoneMatch?: string },
  ): Promise<FileReply> {
    const row = this.repo.findInShop(scope.shopId, id);
    if (!row || row.jobId !== scope.jobId || row.deletedAt || row.purgedAt) throw notFound('Media');
    const d = this.repo.findDerivative(row.id, variant) ?? this.repo.findDerivative(row.id, 'poster');
    if (!d) throw notFound('Media variant');
    return this.serve({ key: d.key, sha256: d.sha256, mime: 'image/jpeg' }, id, variant, req);
  }

  private async serve(
    file: { key: string; sha256: string; mime: string },
    id: number,
    variant: string,
    req: { range?: string; ifNoneMatch?: string },
  ): Promise<FileReply> {
    const stat = await this.storage.stat(file.key);
    if (!stat) throw notFound('Media file');
    const etag = `"${file.sha256}"`;
    const headers: Record<string, string> = {
      'Content-Type': file.mime,
      'Cache-Control': 'private, max-age=3600',
      ETag: etag,
      'Accept-Ranges': 'bytes',
      'Content-Disposition': `inline; filename="media-${id}-${variant}.${EXT[file.mime] ?? 'bin'}"`,
    };
    if (req.ifNoneMatch && req.ifNoneMatch.split(',').some((t) => t.trim() === etag)) return { status: 304, headers, body: null };
    const range = parseRange(req.range, stat.bytes);
    if (range.kind === 'unsatisfiable') return { status: 416, headers: { ...headers, 'Content-Range': `bytes */${stat.bytes}` }, body: null };
    if (range.kind === 'partial') {
      const length = range.end - range.start + 1;
      return {
        status: 206,
        headers: { ...headers, 'Content-Range': `bytes ${range.start}-${range.end}/${stat.bytes}`, 'Content-Length': String(length) },
        body: this.storage.createReadStream(file.key, range),
      };
    }
    return { status: 200, headers: { ...headers, 'Content-Length': String(stat.bytes) }, body: this.storage.createReadStream(file.key) };
  }

  private locate(actor: AuthUser, id: number, variant: MediaVariant | 'original'): { key: string; sha256: string; mime: string } {
    const row = this.repo.findInShop(actor.shopId, id);
    const hidden = !row || row.purgedAt || (row.deletedAt && !roleCan(actor.role, 'media.view_deleted'));
    if (!row || hidden || !row.originalKey) throw notFound('Media');
    if (variant === 'original') return { key: row.originalKey, sha256: row.sha256, mime: row.mime };
    const d = this.repo.findDerivative(row.id, variant);
    if (!d) throw notFound('Media variant');
    return { key: d.key, sha256: d.sha256, mime: 'image/jpeg' };
  }
}
