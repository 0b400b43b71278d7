import { z } from 'zod';
import { ErrorCodeSchema } from './errors';
import { MediaAreaSchema, MediaAssetDtoSchema } from './media';
import { PairCropSchema } from './pairs';

/**
 * The showcase: consented before/after pairs for the shop's marketing. An item is
 * listed only while its job's current consent is granted and covers the pair.
 */

/** Export sizes in pixels: a square and a portrait social post, a wide web banner. */
export const SHOWCASE_SIZES = {
  square: { width: 1080, height: 1080, label: 'Square post 1080×1080' },
  portrait: { width: 1080, height: 1350, label: 'Portrait post 1080×1350' },
  banner: { width: 1600, height: 600, label: 'Web banner 1600×600' },
} as const;
export const SHOWCASE_SIZE_KEYS = ['square', 'portrait', 'banner'] as const;
export type ShowcaseSize = (typeof SHOWCASE_SIZE_KEYS)[number];

/** What a file shows: both shots composed, or one shot alone. */
export const SHOWCASE_VARIANTS = ['pair', 'before', 'after'] as const;
export type ShowcaseVariant = (typeof SHOWCASE_VARIANTS)[number];

export const ShowcaseConsentDtoSchema = z.object({
  grantedAt: z.string(),
  nameMakeModel: z.boolean(),
  wordingVersion: z.string(),
  method: z.enum(['owner_link', 'in_person']),
});

export const ShowcaseItemDtoSchema = z.object({
  pairId: z.number().int(),
  jobId: z.number().int(),
  area: MediaAreaSchema,
  caption: z.string(),
  favourite: z.boolean(),
  crop: PairCropSchema.nullable(),
  before: MediaAssetDtoSchema,
  after: MediaAssetDtoSchema,
  /** When the after shot was taken (or uploaded): what the date filter uses. */
  date: z.string(),
  consent: ShowcaseConsentDtoSchema,
});
export type ShowcaseItemDto = z.infer<typeof ShowcaseItemDtoSchema>;

const isoDay = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2026-03-01.');
export const ShowcaseQuerySchema = z.object({
  area: MediaAreaSchema.optional(),
  from: isoDay.optional(),
  to: isoDay.optional(),
  favourites: z.enum(['true', 'false']).optional(),
});
export type ShowcaseQuery = z.infer<typeof ShowcaseQuerySchema>;

export const UpdateShowcaseItemRequestSchema = z.object({
  favourite: z.boolean().optional(),
  caption: z.string().trim().max(300, 'Keep the caption under 300 characters.').optional(),
});
export type UpdateShowcaseItemRequest = z.infer<typeof UpdateShowcaseItemRequestSchema>;

export const ShowcaseExportQuerySchema = z.object({
  variant: z.enum(SHOWCASE_VARIANTS).default('pair'),
  size: z.enum(SHOWCASE_SIZE_KEYS).default('square'),
  layout: z.enum(['side', 'stacked']).optional(),
});
export type ShowcaseExportQuery = z.infer<typeof ShowcaseExportQuerySchema>;

/**
 * A selection of this many files or more is made as a background task with progress on
 * screen rather than streamed: at roughly half a second per composed print-size file,
 * that is where a silent download would start to look stuck.
 */
export const SHOWCASE_BACKGROUND_FROM = 8;

export const ShowcaseZipRequestSchema = z.object({
  items: z
    .array(ShowcaseExportQuerySchema.extend({ pairId: z.number().int() }))
    .min(1, 'Pick at least one item.')
    .max(500),
});
export type ShowcaseZipRequest = z.infer<typeof ShowcaseZipRequestSchema>;

export const ShowcaseExportTaskDtoSchema = z.object({
  key: z.string(),
  state: z.enum(['queued', 'running', 'done', 'failed']),
  progress: z.number(),
  /** Why a failed export stopped (e.g. CONSENT_REVOKED); the screen switches on it. */
  code: ErrorCodeSchema.nullable(),
  error: z.string().nullable(),
});
export type ShowcaseExportTaskDto = z.infer<typeof ShowcaseExportTaskDtoSchema>;

export const CaptionDraftDtoSchema = z.object({ caption: z.string() });
export type CaptionDraftDto = z.infer<typeof CaptionDraftDtoSchema>;

/** After a revocation: what left the shop for this job, so it can be taken down. */
export const ShowcaseDownloadDtoSchema = z.object({
  at: z.string(),
  userId: z.number().int().nullable(),
  pairId: z.number().int(),
  variant: z.string(),
  size: z.string(),
  bytes: z.number().int(),
});
export type ShowcaseDownloadDto = z.infer<typeof ShowcaseDownloadDtoSchema>;
