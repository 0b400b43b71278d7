import { z } from 'zod';
import { MediaAssetDtoSchema } from './media';

const unit = z.number().min(0).max(1);

/**
 * One crop rectangle shared by both shots, in normalised coordinates of the upright
 * image (0..1 from the top-left), so both show the same region whatever their size.
 */
export const PairCropSchema = z
  .object({ x: unit, y: unit, w: z.number().gt(0).max(1), h: z.number().gt(0).max(1) })
  .refine((c) => c.x + c.w <= 1 + 1e-9, { message: 'The crop runs off the right edge.', path: ['w'] })
  .refine((c) => c.y + c.h <= 1 + 1e-9, { message: 'The crop runs off the bottom edge.', path: ['h'] });
export type PairCrop = z.infer<typeof PairCropSchema>;

const caption = z.string().trim().max(300, 'Keep the caption under 300 characters.');
const assetId = z.number({ message: 'Pick a shot.' }).int().positive('Pick a shot.');

export const CreatePairRequestSchema = z.object({
  beforeAssetId: assetId,
  afterAssetId: assetId,
  caption: caption.default(''),
  crop: PairCropSchema.nullable().default(null),
});
export type CreatePairRequest = z.input<typeof CreatePairRequestSchema>;

export const UpdatePairRequestSchema = z
  .object({ caption: caption.optional(), crop: PairCropSchema.nullable().optional() })
  .refine((v) => v.caption !== undefined || v.crop !== undefined, { message: 'Nothing to change.' });
export type UpdatePairRequest = z.infer<typeof UpdatePairRequestSchema>;

/** The job's pairs in their new order: every pair id exactly once. */
export const ReorderPairsRequestSchema = z.object({
  ids: z
    .array(z.number().int().positive())
    .min(1)
    .refine((ids) => new Set(ids).size === ids.length, { message: 'A pair is listed twice.' }),
});
export type ReorderPairsRequest = z.infer<typeof ReorderPairsRequestSchema>;

export const ShotPairDtoSchema = z.object({
  id: z.number().int(),
  jobId: z.number().int(),
  position: z.number().int(),
  caption: z.string(),
  crop: PairCropSchema.nullable(),
  before: MediaAssetDtoSchema,
  after: MediaAssetDtoSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type ShotPairDto = z.infer<typeof ShotPairDtoSchema>;

export const PairSuggestionDtoSchema = z.object({
  before: MediaAssetDtoSchema,
  after: MediaAssetDtoSchema,
  /** 0..1, higher is a likelier pair. */
  score: z.number(),
  sameArea: z.boolean(),
  order: z.enum(['after', 'before', 'unknown']),
  /** Differing bits of the two 64-bit perceptual hashes; null while a hash is being computed. */
  distance: z.number().int().nullable(),
  /** One of the one-to-one picks (each shot used once), listed before the other combinations. */
  best: z.boolean(),
});
export type PairSuggestionDto = z.infer<typeof PairSuggestionDtoSchema>;

export const PairSuggestionsDtoSchema = z.object({
  suggestions: z.array(PairSuggestionDtoSchema),
  /** Stills whose hash is not computed yet: their suggestions rest on tags and times only. */
  pendingHashes: z.number().int(),
});
export type PairSuggestionsDto = z.infer<typeof PairSuggestionsDtoSchema>;
