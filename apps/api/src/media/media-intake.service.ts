import { Inject, Injectable } from '@nestjs/common';
import { type MediaAssetDto, type UploadMeta } from '@benchproof/contracts';
import { mediaKindFor, type MediaKind } from '@benchproof/domain';
import { randomUUID } from 'node:crypto';
import { AuditService } from '../audit';
import { APP_CONFIG, type AppConfig } from '../config';
import type { AuthUser } from '../core/auth';
import { DomainError } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { IMAGE, type ImageAdapter } from '../infra/image';
import { SNIFFER, type FileSniffer } from '../infra/sniff';
import { STORAGE, UPLOAD_TEMP, type Storage, type UploadTemp } from '../infra/storage';
import { VIDEO_PROBE, type VideoProbe } from '../infra/video';
import { JobAccess } from '../jobs';
import { MediaDerivativesService } from './media-derivatives.service';
import { toMediaDto } from './media.mapper';
import { MediaRepository, type MediaAssetRow } from './media.repository';
import { acceptedType, type AcceptedType } from './media-types';
import { UnitOfWork, type DbTx } from '../core/db';

/** A file already on local disk (multer temp file or finished resumable upload). */
export interface IncomingFile {
  path: string;
  originalName: string;
  size: number;
  /** SHA-256 (hex) computed while the bytes arrived, when the channel did that (tus). */
  sha256?: string;
}

interface Dims {
  width: number;
  height: number;
}

interface Probed {
  width: number | null;
  height: number | null;
  durationMs: number | null;
  capturedAt: Date | null;
}

/**
 * Turns one incoming file into a stored media asset: type from the bytes, size per
 * kind, full decode for images, then the original is moved into storage once
 * (read-only, keyed by a random id) and derivatives are queued. The temp file is
 * always gone afterwards, whatever happened.
 */
@Injectable()
export class MediaIntakeService {
  constructor(
    private readonly uow: UnitOfWork,
    private readonly repo: MediaRepository,
    private readonly derivatives: MediaDerivativesService,
    private readonly audit: AuditService,
    private readonly jobs: JobAccess,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(UPLOAD_TEMP) private readonly temp: UploadTemp,
    @Inject(SNIFFER) private readonly sniffer: FileSniffer,
    @Inject(IMAGE) private readonly image: ImageAdapter,
    @Inject(VIDEO_PROBE) private readonly video: VideoProbe,
  ) {}

  async intake(actor: AuthUser, jobId: number, file: IncomingFile, meta: UploadMeta, channel: 'multipart' | 'resumable'): Promise<MediaAssetDto> {
    try {
      const earlier = this.earlier(actor, jobId, meta);
      if (earlier) return earlier;
      const { type, dims } = await this.validate(file);
      const kind = this.kindFor(actor, jobId, meta, type);
      const probed = await this.probe(file.path, type, dims);
      let row: MediaAssetRow;
      try {
        row = await this.store(actor, jobId, file, meta, { type, kind, probed, channel });
      } catch (err) {
        // Two sends of one shot raced past the look-up: the unique (shop, client id) index kept one; answer with it.
        const raced = isClientIdClash(err) ? this.earlier(actor, jobId, meta) : null;
        if (raced) return raced;
        throw err;
      }
      return toMediaDto(row, []);
    } finally {
      await this.temp.remove(file.path);
    }
  }

  /** The asset an earlier send of the same client id stored (a retry after a lost answer), else null. */
  private earlier(actor: AuthUser, jobId: number, meta: UploadMeta): MediaAssetDto | null {
    if (!meta.clientId) return null;
    const row = this.repo.findByClientId(actor.shopId, meta.clientId);
    if (!row) return null;
    if (row.jobId !== jobId) throw new DomainError('CONFLICT', 'This shot was already uploaded to another job.', { assetId: row.id });
    return toMediaDto(row, this.repo.derivativesOf([row.id]));
  }

  /** Removes a temp file that was not (or no longer) needed; harmless after a successful move. */
  async discard(file: IncomingFile): Promise<void> {
    await this.temp.remove(file.path);
  }

  /** Checks an image upload (a poster frame) the same way, without storing it as an asset. */
  async validateImage(file: IncomingFile): Promise<void> {
    const { type } = await this.validate(file);
    if (type.family !== 'image') throw new DomainError('UNSUPPORTED_MEDIA_TYPE', 'A poster frame must be a JPEG, PNG or WebP image.');
  }

  async validate(file: IncomingFile): Promise<{ type: AcceptedType; dims: Dims | null }> {
    if (file.size === 0) throw new DomainError('FILE_EMPTY');
    const type = acceptedType(await this.sniffer.sniff(file.path), this.image.canReadHeic());
    if (!type) throw new DomainError('UNSUPPORTED_MEDIA_TYPE', 'Only JPEG, PNG, WebP (HEIC where supported) photos and MP4, MOV or WebM videos are accepted.');
    const limit = type.family === 'image' ? this.cfg.MAX_PHOTO_BYTES : this.cfg.MAX_VIDEO_BYTES;
    if (file.size > limit) throw new DomainError('FILE_TOO_LARGE', undefined, { limitBytes: limit });
    if (type.family === 'image') {
      const check = await this.image.check(file.path);
      if (!check.ok && check.reason === 'too_many_pixels') throw new DomainError('IMAGE_TOO_LARGE', undefined, { maxPixels: this.cfg.MAX_IMAGE_PIXELS });
      if (!check.ok && check.reason === 'unsupported') throw new DomainError('UNSUPPORTED_MEDIA_TYPE');
      if (!check.ok) throw new DomainError('FILE_CORRUPT');
      // Width and height as the upright image shows them: orientations 5–8 swap them (CIPA DC-008).
      const swap = check.orientation >= 5;
      return { type, dims: { width: swap ? check.height : check.width, height: swap ? check.width : check.height } };
    }
    return { type, dims: null };
  }

  /** Stills grabbed from a video keep their source; a still from a scope video is a scope still. */
  private kindFor(actor: AuthUser, jobId: number, meta: UploadMeta, type: AcceptedType): MediaKind {
    const isVideo = type.family === 'video';
    if (meta.sourceAssetId === undefined) {
      if (meta.timecodeMs !== undefined) throw new DomainError('VALIDATION_FAILED', 'timecodeMs needs sourceAssetId.');
      return mediaKindFor(meta.source, isVideo);
    }
    const parent = this.repo.findInShop(actor.shopId, meta.sourceAssetId);
    const parentIsVideo = parent?.kind === 'video' || parent?.kind === 'scope_video';
    if (!parent || parent.jobId !== jobId || !parentIsVideo || isVideo) {
      throw new DomainError('VALIDATION_FAILED', 'sourceAssetId must be a video of the same job, and the upload a still image.');
    }
    return mediaKindFor(parent.kind === 'scope_video' ? 'scope' : meta.source, false);
  }

  private async probe(path: string, type: AcceptedType, dims: Dims | null): Promise<Probed> {
    if (type.family === 'video' || !dims) {
      const info = await this.video.probe(path);
      if (!info) throw new DomainError('VIDEO_UNREADABLE');
      return { ...info, capturedAt: null };
    }
    return { ...dims, durationMs: null, capturedAt: await this.image.captureTime(path) };
  }

  private async store(
    actor: AuthUser,
    jobId: number,
    file: IncomingFile,
    meta: UploadMeta,
    found: { type: AcceptedType; kind: MediaKind; probed: Probed; channel: 'multipart' | 'resumable' },
  ): Promise<MediaAssetRow> {
    const stored = await this.storage.adoptLocalFile(`originals/${actor.shopId}/${randomUUID()}`, file.path, { immutable: true, sha256: file.sha256 });
    try {
      return this.uow.run((tx) => this.remember(actor, jobId, file, meta, found, stored, tx));
    } catch (err) {
      // No row, no file: the original must not outlive a failed commit (the sweep catches a crash in between).
      await this.storage.delete(stored.key).catch(() => undefined);
      throw err;
    }
  }

  /** The row, its audit record and its derivative task commit together (or the caller removes the file). */
  private remember(
    actor: AuthUser,
    jobId: number,
    file: IncomingFile,
    meta: UploadMeta,
    found: { type: AcceptedType; kind: MediaKind; probed: Probed; channel: 'multipart' | 'resumable' },
    stored: { key: string; sha256: string; bytes: number },
    tx: DbTx,
  ): MediaAssetRow {
    // Checked before the bytes were taken too; here a manager's override on a closed job is audited with the row.
    this.jobs.change(actor, jobId, 'media', tx);
    const row = this.repo.insert({
      shopId: actor.shopId,
      jobId,
      kind: found.kind,
      phase: meta.phase,
      area: meta.area,
      source: meta.source,
      caption: meta.caption,
      originalKey: stored.key,
      originalName: file.originalName.slice(0, 255),
      mime: found.type.mime,
      sha256: stored.sha256,
      byteSize: stored.bytes,
      ...found.probed,
      uploadedAt: this.clock.now(),
      uploadedBy: actor.id,
      sourceAssetId: meta.sourceAssetId ?? null,
      timecodeMs: meta.timecodeMs ?? null,
      clientId: meta.clientId ?? null,
      derivativeStatus: found.type.family === 'image' ? 'pending' : 'ready',
    });
    this.audit.record(actor, {
      action: 'media.uploaded',
      entityType: 'media_asset',
      entityId: row.id,
      details: { jobId, kind: found.kind, mime: row.mime, sha256: row.sha256, bytes: row.byteSize, channel: found.channel },
    });
    if (found.type.family === 'image') this.derivatives.enqueue(row, tx);
    return row;
  }
}

/** better-sqlite3's unique-constraint failure on the client id index (drizzle may wrap it as `cause`). */
function isClientIdClash(err: unknown): boolean {
  for (let e: unknown = err; e instanceof Error; e = e.cause) {
    if ((e as { code?: string }).code === 'SQLITE_CONSTRAINT_UNIQUE' && e.message.includes('client_id')) return true;
  }
  return false;
}
