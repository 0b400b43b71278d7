import { Injectable } from '@nestjs/common';
import { type MediaAssetDto, type UploadBatchResult, type UploadFileResult, UploadMetaSchema } from '@benchproof/contracts';
import { ERROR_CODES } from '@benchproof/contracts';
import type { AuthUser } from '../core/auth';
import { DomainError, ZodPipe } from '../core/http';
import { MediaDerivativesService } from './media-derivatives.service';
import { type IncomingFile, MediaIntakeService } from './media-intake.service';
import { MediaService } from './media.service';

/**
 * A multipart batch: every file is handled on its own and reported in order, so one
 * bad file does not sink the rest. Temp files are removed on every path.
 */
@Injectable()
export class MediaUploadService {
  constructor(
    private readonly media: MediaService,
    private readonly intake: MediaIntakeService,
    private readonly derivatives: MediaDerivativesService,
  ) {}

  /** 201 when all were stored, 207 when some were; when none was, the first failure is thrown with every result in details. */
  async uploadBatch(actor: AuthUser, jobIdParam: string, files: IncomingFile[], fields: unknown): Promise<{ status: 201 | 207; body: UploadBatchResult }> {
    try {
      const jobId = parseId(jobIdParam);
      this.media.checkOpenJob(actor, jobId);
      const meta = new ZodPipe(UploadMetaSchema).transform(fields);
      if (!files.length) throw new DomainError('VALIDATION_FAILED', 'Attach at least one file in the "files" field.');
      if (meta.clientId && files.length > 1) throw new DomainError('VALIDATION_FAILED', 'A clientId names one shot: send one file with it.');
      const results: UploadFileResult[] = [];
      for (const [index, file] of files.entries()) results.push(await this.one(actor, jobId, file, meta, index));
      const assets = results.flatMap((r) => (r.ok ? [r.asset] : []));
      const firstError = results.find((r) => !r.ok);
      if (!firstError) return { status: 201, body: { assets, results } };
      if (assets.length) return { status: 207, body: { assets, results } };
      throw new DomainError(firstError.error.code, firstError.error.message, { results });
    } finally {
      await Promise.all(files.map((f) => this.intake.discard(f)));
    }
  }

  private async one(
    actor: AuthUser,
    jobId: number,
    file: IncomingFile,
    meta: ReturnType<typeof UploadMetaSchema.parse>,
    index: number,
  ): Promise<UploadFileResult> {
    const name = file.originalName;
    try {
      return { ok: true, index, name, asset: await this.intake.intake(actor, jobId, file, meta, 'multipart') };
    } catch (err) {
      if (!(err instanceof DomainError)) throw err;
      return { ok: false, index, name, error: { code: err.code, message: err.message } };
    }
  }

  /** Sets a video's poster frame from an image the browser captured; answers the updated asset. */
  async setPoster(actor: AuthUser, jobIdParam: string, idParam: string, file: IncomingFile | undefined): Promise<MediaAssetDto> {
    try {
      if (!file) throw new DomainError('VALIDATION_FAILED', 'Attach the frame in the "file" field.');
      const row = this.media.owned(actor, parseId(jobIdParam), parseId(idParam));
      if (row.kind !== 'video' && row.kind !== 'scope_video') throw new DomainError('CONFLICT', 'Only videos take a poster frame.');
      await this.intake.validateImage(file);
      await this.derivatives.savePoster(row, file.path);
      return this.media.toDtos([row])[0];
    } finally {
      if (file) await this.intake.discard(file);
    }
  }
}

function parseId(value: string): number {
  const id = Number(value);
  if (!Number.isInteger(id) || id <= 0) throw new DomainError('NOT_FOUND', ERROR_CODES.NOT_FOUND.message);
  return id;
}
