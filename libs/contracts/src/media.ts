import { MEDIA_AREAS, MEDIA_KINDS, MEDIA_PHASES, MEDIA_SOURCES } from '@benchproof/domain';
import { z } from 'zod';
import { ErrorCodeSchema } from './errors';

export const MediaPhaseSchema = z.enum(MEDIA_PHASES);
export const MediaSourceSchema = z.enum(MEDIA_SOURCES);
export const MediaKindSchema = z.enum(MEDIA_KINDS);
export const MediaAreaSchema = z.enum(MEDIA_AREAS);

/** Sized, upright, metadata-free copies made from an original. */
export const MEDIA_VARIANTS = ['thumb', 'screen', 'print', 'poster'] as const;
export const MediaVariantSchema = z.enum(MEDIA_VARIANTS);
export type MediaVariant = z.infer<typeof MediaVariantSchema>;

/** pending = derivatives queued; ready = all made (or none needed); failed = see derivativeError. */
export const DerivativeStatusSchema = z.enum(['pending', 'ready', 'failed']);
export type DerivativeStatus = z.infer<typeof DerivativeStatusSchema>;

const caption = z.string().trim().max(500);

/** Multipart form fields sent with `files` (strings, hence the coercion). */
export const UploadMetaSchema = z.object({
  phase: MediaPhaseSchema,
  area: MediaAreaSchema,
  source: MediaSourceSchema.default('upload'),
  caption: caption.default(''),
  sourceAssetId: z.coerce.number().int().positive().optional().describe('For a still grabbed from a video of this job'),
  timecodeMs: z.coerce.number().int().min(0).optional().describe('Position of the still in the source video'),
  /** Made up by the device for one shot (a UUID): sending it again returns the asset already stored instead of a second one. */
  clientId: z.uuid().optional().describe('Made up by the device for one shot; sent again, the stored asset is answered'),
});
export type UploadMeta = z.infer<typeof UploadMetaSchema>;

/**
 * Upload-Metadata of a resumable (tus) upload: the same tags plus the job it belongs to.
 * tus-js-client sends `metadata: { jobId, phase, area, source, caption, filename }`.
 */
export const TusUploadMetaSchema = UploadMetaSchema.extend({
  jobId: z.coerce.number().int().positive(),
  filename: z.string().max(255).optional(),
});
export type TusUploadMeta = z.infer<typeof TusUploadMetaSchema>;

export const MediaUrlsSchema = z.object({
  original: z.string(),
  thumb: z.string().nullable(),
  screen: z.string().nullable(),
  print: z.string().nullable(),
  poster: z.string().nullable(),
});

export const MediaAssetDtoSchema = z.object({
  id: z.number().int(),
  jobId: z.number().int(),
  kind: MediaKindSchema,
  phase: MediaPhaseSchema,
  area: MediaAreaSchema,
  source: MediaSourceSchema,
  caption: z.string(),
  status: DerivativeStatusSchema,
  derivativeError: z.string().nullable(),
  width: z.number().int().nullable(),
  height: z.number().int().nullable(),
  durationMs: z.number().int().nullable(),
  /** From the EXIF DateTimeOriginal of the original, when present. */
  capturedAt: z.string().nullable(),
  uploadedAt: z.string(),
  uploadedBy: z.number().int(),
  sha256: z.string(),
  byteSize: z.number().int(),
  mime: z.string(),
  sourceAssetId: z.number().int().nullable(),
  timecodeMs: z.number().int().nullable(),
  deletedAt: z.string().nullable(),
  urls: MediaUrlsSchema,
});
export type MediaAssetDto = z.infer<typeof MediaAssetDtoSchema>;

/**
 * One entry per uploaded file, in the order sent, so a UI can mark each file.
 * The response is 201 when every file was stored, 207 when some were; when none
 * was, the standard error body of the first failure with `details.results`.
 */
export const UploadFileResultSchema = z.discriminatedUnion('ok', [
  z.object({ ok: z.literal(true), index: z.number().int(), name: z.string(), asset: MediaAssetDtoSchema }),
  z.object({
    ok: z.literal(false),
    index: z.number().int(),
    name: z.string(),
    error: z.object({ code: ErrorCodeSchema, message: z.string() }),
  }),
]);
export type UploadFileResult = z.infer<typeof UploadFileResultSchema>;

export const UploadBatchResultSchema = z.object({
  assets: z.array(MediaAssetDtoSchema),
  results: z.array(UploadFileResultSchema),
});
export type UploadBatchResult = z.infer<typeof UploadBatchResultSchema>;

const bool = z.union([z.boolean(), z.enum(['true', 'false'])]).transform((v) => v === true || v === 'true');

export const MediaListQuerySchema = z.object({
  phase: MediaPhaseSchema.optional(),
  area: MediaAreaSchema.optional(),
  kind: MediaKindSchema.optional(),
  /** Managers only; ignored for other roles. */
  includeDeleted: bool.optional(),
});
export type MediaListQuery = z.infer<typeof MediaListQuerySchema>;

const tags = {
  phase: MediaPhaseSchema.optional(),
  area: MediaAreaSchema.optional(),
  caption: caption.optional(),
};

export const RetagOneRequestSchema = z.object(tags).refine((v) => Object.values(v).some((x) => x !== undefined), 'Nothing to change');
export type RetagOneRequest = z.infer<typeof RetagOneRequestSchema>;

export const RetagRequestSchema = z
  .object({ ids: z.array(z.number().int().positive()).min(1).max(500), ...tags })
  .refine((v) => v.phase !== undefined || v.area !== undefined || v.caption !== undefined, 'Nothing to change');
export type RetagRequest = z.infer<typeof RetagRequestSchema>;

export const FindingMediaRequestSchema = z.object({
  assetIds: z.array(z.number().int().positive()).max(100),
});
export type FindingMediaRequest = z.infer<typeof FindingMediaRequestSchema>;

export const FindingMediaDtoSchema = z.object({
  findingId: z.number().int(),
  assets: z.array(MediaAssetDtoSchema),
});
export type FindingMediaDto = z.infer<typeof FindingMediaDtoSchema>;

/** State of a resumable upload, for a UI that reconnects (GET /api/media/tus/:uploadId). */
export const TusUploadStatusSchema = z.object({
  uploadId: z.string(),
  offset: z.number().int(),
  length: z.number().int().nullable(),
  assetId: z.number().int().nullable(),
  error: z.object({ code: ErrorCodeSchema, message: z.string() }).nullable(),
});
export type TusUploadStatus = z.infer<typeof TusUploadStatusSchema>;
