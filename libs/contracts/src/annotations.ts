import { z } from 'zod';

/**
 * The annotation document at the API edge (current schemaVersion only; stored older
 * versions are migrated on read by libs/annotation). Mirrors the types in
 * libs/annotation, which may not depend on zod; the api assigns the parsed value to
 * that type, so the compiler keeps the two in step.
 */
export const ANNOTATION_COLOURS = ['amber', 'cyan', 'magenta', 'lime', 'white', 'ink'] as const;
export const ANNOTATION_WIDTHS = ['thin', 'medium', 'bold'] as const;
/** Enough for any honest annotation, small enough that a document stays a few hundred kB. */
export const MAX_SHAPES = 300;
export const MAX_PEN_POINTS = 2000;

const unit = z.number().min(0, 'Points must lie on the image (0 to 1).').max(1, 'Points must lie on the image (0 to 1).');
const PointSchema = z.strictObject({ x: unit, y: unit });
const base = {
  id: z.string().min(1).max(40),
  colour: z.enum(ANNOTATION_COLOURS),
  width: z.enum(ANNOTATION_WIDTHS),
};
const radius = z.number().positive('A ring needs a size.').max(1);

export const AnnotationShapeSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ ...base, kind: z.literal('ring'), centre: PointSchema, rx: radius, ry: radius }),
    z.strictObject({ ...base, kind: z.literal('arrow'), from: PointSchema, to: PointSchema }),
    z.strictObject({ ...base, kind: z.literal('pen'), points: z.array(PointSchema).min(1).max(MAX_PEN_POINTS) }),
    z.strictObject({ ...base, kind: z.literal('label'), at: PointSchema, text: z.string().trim().min(1, 'A label needs text.').max(120) }),
    z.strictObject({ ...base, kind: z.literal('ruler'), from: PointSchema, to: PointSchema, pitches: z.number().int().min(1).max(240).optional() }),
    z.strictObject({
      ...base,
      kind: z.literal('scale'),
      from: PointSchema,
      to: PointSchema,
      knownMm: z.number().positive('Enter the real length in mm.').max(2000),
    }),
    z.strictObject({ ...base, kind: z.literal('blur'), topLeft: PointSchema, bottomRight: PointSchema }),
  ],
  { error: 'Unknown shape kind.' },
);
export type AnnotationShapeDto = z.infer<typeof AnnotationShapeSchema>;

export const AnnotationDocumentSchema = z
  .strictObject({
    schemaVersion: z.literal(2, 'This editor is out of date: reload the page.'),
    image: z.strictObject({ width: z.number().int().positive(), height: z.number().int().positive() }),
    shapes: z.array(AnnotationShapeSchema).max(MAX_SHAPES),
  })
  .refine((d) => new Set(d.shapes.map((s) => s.id)).size === d.shapes.length, { message: 'Shape ids must be unique.', path: ['shapes'] });
export type AnnotationDocumentDto = z.infer<typeof AnnotationDocumentSchema>;

/** PUT body: the whole document plus the version it was edited from (0 for the first save). */
export const SaveAnnotationSchema = z.strictObject({
  baseVersion: z.number().int().min(0),
  document: AnnotationDocumentSchema,
});
export type SaveAnnotationRequest = z.infer<typeof SaveAnnotationSchema>;

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
