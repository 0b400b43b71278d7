import { Inject, Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { ERROR_CODES, type ErrorCode, type TusUploadStatus, TusUploadMetaSchema } from '@benchproof/contracts';
import { Server } from '@tus/server';
import type { Upload } from '@tus/utils';
import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { join } from 'node:path';
import { NodeRequest, sendNodeResponse } from 'srvx/node';
import { APP_CONFIG, type AppConfig } from '../config';
import type { AuthUser } from '../core/auth';
import { LIVE_UPDATES, type LiveUpdates } from '../core/events';
import { DomainError, domainErrorOf, notFound } from '../core/http';
import { type MaybeRedis, REDIS, RedisTusLocker } from '../infra/redis';
import { UPLOAD_TEMP, type UploadTemp } from '../infra/storage';
import { MediaIntakeService } from './media-intake.service';
import { withJsonError } from './media-tus.errors';
import { MediaService } from './media.service';
import { HashingFileStore } from './tus-hashing-store';

export const TUS_PATH = '/api/media/tus';
const UPLOAD_ID = /^[a-f0-9]{32}$/;

type Finished = { shopId: number; assetId: number | null; error: { code: ErrorCode; message: string } | null; size: number };
type NodeRequest = IncomingMessage & { user?: AuthUser };
type TusRequest = { runtime?: { node?: { req?: NodeRequest } }; node?: { req?: NodeRequest } };

/** @tus/server answers a hook failure with the error's `status_code` and `body`. */
class TusHookError extends Error {
  constructor(
    readonly status_code: number,
    readonly body: string,
  ) {
    super(body);
  }
}

/** The Nest session guard has run before tus sees the request; this reads the user it attached. */
function actorOf(req: unknown): AuthUser {
  const r = req as TusRequest;
  const node = r.runtime?.node?.req ?? r.node?.req;
  if (!node?.user) throw new TusHookError(401, JSON.stringify({ code: 'UNAUTHENTICATED', message: ERROR_CODES.UNAUTHENTICATED.message, details: null }));
  return node.user;
}

/**
 * tus Upload-Metadata may carry a key with no value (tus-js-client sends an empty caption
 * that way, and @tus/server reads it as null); such a key means "not given".
 */
const presentValues = (metadata: Record<string, string | null> | undefined): Record<string, string> =>
  Object.fromEntries(Object.entries(metadata ?? {}).filter((e): e is [string, string] => e[1] !== null));

const tusError = (err: DomainError) => new TusHookError(err.status, JSON.stringify({ code: err.code, message: err.message, details: err.details }));

/**
 * Resumable uploads (tus 1.0 via @tus/server + @tus/file-store). Partial files sit in
 * UPLOADS_DIR/tus; the job and tags travel in Upload-Metadata. The upload is tied to
 * the shop of the user who created it, and each later request is checked against it.
 * When the last byte arrives the file goes through the same intake as a multipart upload.
 */
@Injectable()
export class MediaTusService implements OnModuleInit {
  private readonly logger = new Logger('MediaTus');
  private server!: Server;
  private store!: HashingFileStore;
  /** Outcome of recently finished uploads, so a client that lost the final response can ask. */
  private readonly finished = new Map<string, Finished>();

  constructor(
    private readonly intake: MediaIntakeService,
    private readonly media: MediaService,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(UPLOAD_TEMP) private readonly temp: UploadTemp,
    @Inject(REDIS) private readonly redis: MaybeRedis,
    @Inject(LIVE_UPDATES) private readonly live: LiveUpdates,
  ) {}

  onModuleInit(): void {
    // The tus expiration extension: unfinished uploads answer Upload-Expires and are removed after it.
    this.store = new HashingFileStore({ directory: this.temp.resumableDir, expirationPeriodInMilliseconds: this.cfg.TUS_EXPIRE_HOURS * 3600_000 });
    this.server = new Server({
      path: TUS_PATH,
      datastore: this.store,
      // Several API processes (REDIS_URL): an upload's lock is held in Redis, else tus's in-memory locker.
      ...(this.redis ? { locker: new RedisTusLocker(this.redis, this.live) } : {}),
      relativeLocation: true,
      respectForwardedHeaders: false,
      // The web app is served from this origin; no other site may drive uploads from a browser.
      allowedOrigins: (origin: string) => origin === this.cfg.appOrigin,
      allowedCredentials: true,
      maxSize: this.cfg.MAX_VIDEO_BYTES,
      namingFunction: () => randomUUID().replace(/-/g, ''),
      onUploadCreate: (req, upload) => this.onCreate(req, upload),
      onUploadFinish: (req, upload) => this.onFinish(req, upload),
    });
  }

  /** Hands the raw request to tus once the caller may touch this upload (404 for other shops). */
  async handle(actor: AuthUser, uploadId: string | null, req: IncomingMessage, res: ServerResponse): Promise<void> {
    if (uploadId !== null) await this.assertAccess(actor, uploadId);
    // handle() would send tus's plain-text errors as they are; this turns them into the one JSON error shape first.
    const response = await this.server.handleWeb(new NodeRequest({ req, res }));
    await sendNodeResponse(res, await withJsonError(response, req.method ?? 'GET'));
  }

  async status(actor: AuthUser, uploadId: string): Promise<TusUploadStatus> {
    const done = this.finished.get(uploadId);
    if (done && done.shopId === actor.shopId) return { uploadId, offset: done.size, length: done.size, assetId: done.assetId, error: done.error };
    const upload = await this.assertAccess(actor, uploadId);
    return { uploadId, offset: upload.offset, length: upload.size ?? null, assetId: null, error: null };
  }

  /** Deletes unfinished uploads past their Upload-Expires (run by the periodic storage sweep). */
  expireAbandoned(): Promise<number> {
    return this.server.cleanUpExpiredUploads();
  }

  /** Deletes uploads whose metadata is unreadable (a start cut off by a full disk or a crash) once idle since `olderThan`. */
  removeUnreadable(olderThan: Date): Promise<number> {
    return this.store.removeUnreadable(olderThan);
  }

  private async assertAccess(actor: AuthUser, uploadId: string): Promise<Upload> {
    if (!UPLOAD_ID.test(uploadId)) throw notFound('Upload');
    const upload = await this.store.getUpload(uploadId).catch(() => null);
    if (!upload || upload.metadata?.shopId !== String(actor.shopId)) throw notFound('Upload');
    return upload;
  }

  /** Runs before any byte is accepted: the job must be the caller's shop's; the upload is stamped with who sent it. */
  private onCreate(req: unknown, upload: Upload): Promise<{ metadata: Record<string, string | null> }> {
    const actor = actorOf(req);
    const parsed = TusUploadMetaSchema.safeParse(presentValues(upload.metadata));
    if (!parsed.success) throw tusError(new DomainError('VALIDATION_FAILED', 'Upload-Metadata needs jobId, phase and area.', { issues: parsed.error.issues }));
    try {
      this.media.checkOpenJob(actor, parsed.data.jobId);
    } catch (err) {
      if (err instanceof DomainError) throw tusError(err);
      throw err;
    }
    return Promise.resolve({ metadata: { ...upload.metadata, shopId: String(actor.shopId), userId: String(actor.id) } });
  }

  private async onFinish(req: unknown, upload: Upload): Promise<{ status_code: number; headers: Record<string, string>; body: string }> {
    const actor = actorOf(req);
    const meta = TusUploadMetaSchema.parse(presentValues(upload.metadata));
    const path = join(this.temp.resumableDir, upload.id);
    const file = { path, originalName: meta.filename ?? '', size: upload.offset, sha256: this.store.digestOf(upload.id, upload.offset) ?? undefined };
    try {
      const asset = await this.intake.intake(actor, meta.jobId, file, meta, 'resumable');
      this.remember(upload.id, { shopId: actor.shopId, assetId: asset.id, error: null, size: upload.offset });
      return { status_code: 204, headers: { 'BenchProof-Media-Id': String(asset.id) }, body: '' };
    } catch (err) {
      if (!(err instanceof DomainError)) this.logger.error((err as Error).stack ?? String(err));
      const domain = domainErrorOf(err);
      this.remember(upload.id, { shopId: actor.shopId, assetId: null, error: { code: domain.code, message: domain.message }, size: upload.offset });
      throw tusError(domain);
    } finally {
      await this.temp.remove(`${file.path}.json`);
    }
  }

  private remember(id: string, outcome: Finished): void {
    this.finished.set(id, outcome);
    if (this.finished.size > 1000) this.finished.delete(this.finished.keys().next().value as string);
  }
}
