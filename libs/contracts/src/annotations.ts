import { AnnotationDocumentSchema, maxDocumentBytes, type AnnotationShapeSchema } from '@benchproof/annotation';
import { z } from 'zod';

/**
 * The annotation document's schema lives in libs/annotation (one home for the shape model,
 * its limits and its types); it is re-exported here so API validation and web forms keep
 * taking every request schema from contracts.
 */
export { AnnotationDocumentSchema, AnnotationShapeSchema, MAX_DOCUMENT_PEN_POINTS, MAX_PEN_POINTS, MAX_SHAPES } from '@benchproof/annotation';
export type AnnotationShapeDto = z.infer<typeof AnnotationShapeSchema>;
export type AnnotationDocumentDto = z.infer<typeof AnnotationDocumentSchema>;

/** PUT body: the whole document plus the version it was edited from (0 for the first save). */
export const SaveAnnotationSchema = z.strictObject({
  baseVersion: z.number().int().min(0),
  document: AnnotationDocumentSchema,
});
export type SaveAnnotationRequest = z.infer<typeof SaveAnnotationSchema>;

/**
 * The largest valid save body in bytes of compact JSON: the largest document the schema
 * allows plus the envelope with the widest base version. The save route's body limit.
 */
export function saveAnnotationMaxBytes(): number {
  const envelope = JSON.stringify({ baseVersion: Number.MAX_SAFE_INTEGER, document: null }).length - 'null'.length;
  return envelope + maxDocumentBytes();
}

export const AnnotationDtoSchema = z.object({
  mediaId: z.number().int(),
  /** 0 while the photo has never been annotated. */
  version: z.number().int(),
  document: AnnotationDocumentSchema.nullable(),
  savedAt: z.string().nullable(),
  savedBy: z.number().int().nullable(),
});
export type AnnotationDto = z.infer<typeof AnnotationDtoSchema>;

export const ANNOTATED_SIZES = ['screen', 'print'] as const;
export const AnnotatedSizeSchema = z.enum(ANNOTATED_SIZES);
export type AnnotatedSize = z.infer<typeof AnnotatedSizeSchema>;

/** Records a chain reading from a ruler laid over `pitches` pitches on the saved, calibrated photo. */
export const ChainFromPhotoSchema = z.strictObject({
  rulerId: z.string().min(1).max(40),
  pitches: z.number().int().min(2, 'Count at least 2 pitches.').max(240),
  /** Defaults to the job's chain-wear checkpoint. */
  checkpointId: z.number().int().positive().optional(),
  /** The annotation version the mechanic saw; a newer one means the ruler may have moved. */
  version: z.number().int().positive(),
});
export type ChainFromPhotoRequest = z.infer<typeof ChainFromPhotoSchema>;
