import { Inject, Injectable } from '@nestjs/common';
import { roleCan, type MediaVariant } from '@benchproof/contracts';
import type { Readable } from 'node:stream';
import { buffer } from 'node:stream/consumers';
import type { AuthUser } from '../core/auth';
import { notFound } from '../core/http';
import { STORAGE, type Storage } from '../infra/storage';
import { parseRange } from './byte-range';
import { MediaFileCache } from './media-file-cache';
import { MediaRepository } from './media.repository';

export interface FileReply {
  status: 200 | 206 | 304 | 416;
  headers: Record<string, string>;
  /** A small derivative comes from memory as a Buffer; anything else is streamed from storage. */
  body: Readable | Buffer | null;
}

/** What to send: the storage key, its SHA-256 (the ETag), type, and the size when the database knows it. */
interface FileRef {
  key: string;
  sha256: string;
  mime: string;
  bytes: number | null;
}

type Conditions = { range?: string; ifNoneMatch?: string };

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

  async open(actor: AuthUser, id: number, variant: MediaVariant | 'original', req: Conditions): Promise<FileReply> {
    return this.serve(this.locate(actor, id, variant), id, variant, req);
  }

  /**
   * A screen-sized derivative of a live asset of this job, for the owner page:
   * never the original, never another job's media.
   */
  async openDerivativeOfJob(scope: { shopId: number; jobId: number }, id: number, variant: 'thumb' | 'screen', req: Conditions): Promise<FileReply> {
    const row = this.repo.findFile(scope.shopId, id, variant);
    if (!row || row.jobId !== scope.jobId || row.deletedAt || row.purgedAt) throw notFound('Media');
    const d =
      row.derivativeKey && row.derivativeSha256
        ? { key: row.derivativeKey, sha256: row.derivativeSha256, bytes: row.derivativeBytes }
        : this.repo.findDerivative(row.id, 'poster');
    if (!d) throw notFound('Media variant');
    return this.serve({ key: d.key, sha256: d.sha256, mime: 'image/jpeg', bytes: d.bytes }, id, variant, req);
  }

  private async serve(file: FileRef, id: number, variant: string, req: Conditions): Promise<FileReply> {
    const etag = `"${file.sha256}"`;
    const headers: Record<string, string> = {
      'Content-Type': file.mime,
      'Cache-Control': 'private, max-age=3600',
      ETag: etag,
      'Accept-Ranges': 'bytes',
      'Content-Disposition': `inline; filename="media-${id}-${variant}.${EXT[file.mime] ?? 'bin'}"`,
    };
    // The browser already has these bytes: no disk work at all (RFC 9110 §13.1.2).
    if (req.ifNoneMatch && req.ifNoneMatch.split(',').some((t) => t.trim() === etag)) return { status: 304, headers, body: null };
    const data =
      file.bytes !== null && this.cache.fits(file.bytes) ? await this.cache.get(file.key, file.sha256, file.bytes, () => this.readAll(file.key)) : null;
    const size = data ? data.length : (await this.storage.stat(file.key))?.bytes;
    if (size === undefined) throw notFound('Media file');
    const range = parseRange(req.range, size);
    if (range.kind === 'unsatisfiable') return { status: 416, headers: { ...headers, 'Content-Range': `bytes */${size}` }, body: null };
    if (range.kind === 'partial') {
      headers['Content-Range'] = `bytes ${range.start}-${range.end}/${size}`;
      headers['Content-Length'] = String(range.end - range.start + 1);
      const body = data ? data.subarray(range.start, range.end + 1) : this.storage.createReadStream(file.key, range);
      return { status: 206, headers, body };
    }
    headers['Content-Length'] = String(size);
    return { status: 200, headers, body: data ?? this.storage.createReadStream(file.key) };
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
