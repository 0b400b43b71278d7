import { z } from 'zod';
import { PALETTE, STROKE_WIDTHS, type PaletteColour, type StrokeWidth } from './palette';

/**
 * The annotation document's one schema: the API validates saves with it, libs/contracts
 * re-exports it, and the TypeScript types in document.ts are inferred from it. Limits are
 * enough for any honest annotation and bound a document's size (see size.ts).
 */
export const ANNOTATION_SCHEMA_VERSION = 2;
export const MAX_SHAPES = 300;
export const MAX_PEN_POINTS = 2000;
/** All pen points of one document together: a few long strokes, never 300 full ones. */
export const MAX_DOCUMENT_PEN_POINTS = 20_000;
export const MAX_ID_CHARS = 40;
export const MAX_LABEL_CHARS = 120;
export const MAX_KNOWN_MM = 2000;
export const MAX_PITCHES = 240;
/** JPEG stores each side in 16 bits (ITU-T T.81, frame header), so no photo is larger. */
export const MAX_IMAGE_SIDE = 65_535;

const colours = Object.keys(PALETTE) as [PaletteColour, ...PaletteColour[]];
const widths = Object.keys(STROKE_WIDTHS) as [StrokeWidth, ...StrokeWidth[]];

const unit = z.number().min(0, 'Points must lie on the image (0 to 1).').max(1, 'Points must lie on the image (0 to 1).');
export const PointSchema = z.strictObject({ x: unit, y: unit });
const base = {
  id: z.string().min(1).max(MAX_ID_CHARS),
  colour: z.enum(colours),
  width: z.enum(widths),
};
const radius = z.number().positive('A ring needs a size.').max(1);

export const RingSchema = z.strictObject({ ...base, kind: z.literal('ring'), centre: PointSchema, rx: radius, ry: radius });
export const ArrowSchema = z.strictObject({ ...base, kind: z.literal('arrow'), from: PointSchema, to: PointSchema });
export const PenSchema = z.strictObject({ ...base, kind: z.literal('pen'), points: z.array(PointSchema).min(1).max(MAX_PEN_POINTS) });
/** The length is checked before trimming, so padding cannot smuggle a huge string past the limit. */
export const LabelSchema = z.strictObject({
  ...base,
  kind: z.literal('label'),
  at: PointSchema,
  text: z.string().max(MAX_LABEL_CHARS).trim().min(1, 'A label needs text.'),
});
/** A measured line; `pitches` is set when it was laid over that many chain pitches. */
export const RulerSchema = z.strictObject({
  ...base,
  kind: z.literal('ruler'),
  from: PointSchema,
  to: PointSchema,
  pitches: z.number().int().min(1).max(MAX_PITCHES).optional(),
});
/** A line over something of known length: the photo's calibration. */
export const ScaleSchema = z.strictObject({
  ...base,
  kind: z.literal('scale'),
  from: PointSchema,
  to: PointSchema,
  knownMm: z.number().positive('Enter the real length in mm.').max(MAX_KNOWN_MM),
});
/** Redaction: everything inside is pixelated wherever the image leaves the shop. */
export const BlurSchema = z.strictObject({ ...base, kind: z.literal('blur'), topLeft: PointSchema, bottomRight: PointSchema });

export const AnnotationShapeSchema = z.discriminatedUnion('kind', [RingSchema, ArrowSchema, PenSchema, LabelSchema, RulerSchema, ScaleSchema, BlurSchema], {
  error: 'Unknown shape kind.',
});

const side = z.number().int().positive().max(MAX_IMAGE_SIDE);

export const AnnotationDocumentSchema = z
  .strictObject({
    schemaVersion: z.literal(ANNOTATION_SCHEMA_VERSION, 'This editor is out of date: reload the page.'),
    image: z.strictObject({ width: side, height: side }),
    shapes: z.array(AnnotationShapeSchema).max(MAX_SHAPES),
  })
  .refine((d) => new Set(d.shapes.map((s) => s.id)).size === d.shapes.length, { message: 'Shape ids must be unique.', path: ['shapes'] })
  .refine((d) => d.shapes.reduce((n, s) => n + (s.kind === 'pen' ? s.points.length : 0), 0) <= MAX_DOCUMENT_PEN_POINTS, {
    message: `Too much freehand drawing: at most ${MAX_DOCUMENT_PEN_POINTS} pen points per photo.`,
    path: ['shapes'],
  });
