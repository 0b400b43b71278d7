import type { z } from 'zod';
import { DEFAULT_WIDTH, PALETTE, PALETTE_COLOURS, type PaletteColour } from './palette';
import {
  ANNOTATION_SCHEMA_VERSION,
  type AnnotationDocumentSchema,
  type ArrowSchema,
  type BlurSchema,
  type LabelSchema,
  type PenSchema,
  type PointSchema,
  type RingSchema,
  type RulerSchema,
  type ScaleSchema,
} from './schema';

/**
 * The annotation document: a versioned list of shapes over one photo, in coordinates
 * normalised to the upright image (0..1 on each axis), so the editor and the server
 * renderer draw the same thing at any resolution. Ring radii are normalised too:
 * rx to the image width, ry to the height. The types are inferred from schema.ts.
 */
export { ANNOTATION_SCHEMA_VERSION };

export const SHAPE_KINDS = ['ring', 'arrow', 'pen', 'label', 'ruler', 'scale', 'blur'] as const;
export type ShapeKind = (typeof SHAPE_KINDS)[number];

export type Point = z.infer<typeof PointSchema>;
export type RingShape = z.infer<typeof RingSchema>;
export type ArrowShape = z.infer<typeof ArrowSchema>;
export type PenShape = z.infer<typeof PenSchema>;
export type LabelShape = z.infer<typeof LabelSchema>;
export type RulerShape = z.infer<typeof RulerSchema>;
export type ScaleShape = z.infer<typeof ScaleSchema>;
export type BlurShape = z.infer<typeof BlurSchema>;
export type Shape = RingShape | ArrowShape | PenShape | LabelShape | RulerShape | ScaleShape | BlurShape;
export type ShapeBase = Pick<Shape, 'id' | 'colour' | 'width'>;

export type AnnotationDocument = z.infer<typeof AnnotationDocumentSchema>;

export const emptyDocument = (width: number, height: number): AnnotationDocument => ({
  schemaVersion: ANNOTATION_SCHEMA_VERSION,
  image: { width, height },
  shapes: [],
});

type Migration = (doc: Record<string, unknown>) => Record<string, unknown>;

/**
 * Version 1 stored free hex colours and no stroke width. Version 2 keeps only
 * palette colours (each has an outline that keeps it readable): a v1 colour
 * becomes the palette ink nearest to it in RGB, and every stroke is medium.
 */
const v1ToV2: Migration = (doc) => ({
  ...doc,
  schemaVersion: 2,
  shapes: (Array.isArray(doc.shapes) ? doc.shapes : []).map((s: Record<string, unknown>) => ({
    ...s,
    colour: nearestPaletteColour(typeof s.colour === 'string' ? s.colour : ''),
    width: DEFAULT_WIDTH,
  })),
});

/** MIGRATIONS[n] turns version n into n + 1. */
const MIGRATIONS: Record<number, Migration> = { 1: v1ToV2 };

/**
 * Reads a stored document of any known version and returns the current version.
 * Unknown or future versions are refused rather than guessed at. Shapes are not
 * validated here: the API edge validates with the contracts schema.
 */
export function migrateDocument(raw: unknown): AnnotationDocument {
  if (!raw || typeof raw !== 'object') throw new TypeError('Annotation document must be an object');
  let doc = raw as Record<string, unknown>;
  const start = doc.schemaVersion;
  if (typeof start !== 'number' || !Number.isInteger(start) || start < 1 || start > ANNOTATION_SCHEMA_VERSION) {
    throw new RangeError(`Unsupported annotation schemaVersion ${String(start)}`);
  }
  for (let v = start; v < ANNOTATION_SCHEMA_VERSION; v++) doc = MIGRATIONS[v](doc);
  const image = doc.image as { width?: number; height?: number } | undefined;
  if (!image || !(Number(image.width) > 0) || !(Number(image.height) > 0)) throw new RangeError('Annotation document needs the image size');
  return {
    schemaVersion: ANNOTATION_SCHEMA_VERSION,
    image: { width: Number(image.width), height: Number(image.height) },
    shapes: (Array.isArray(doc.shapes) ? doc.shapes : []) as Shape[],
  };
}

function nearestPaletteColour(hex: string): PaletteColour {
  const m = /^#?([0-9a-f]{6})$/i.exec(hex.trim());
  if (!m) return 'amber';
  const rgb = (h: string) => [0, 2, 4].map((i) => parseInt(h.slice(i, i + 2), 16));
  const [r, g, b] = rgb(m[1]);
  let best: PaletteColour = 'amber';
  let bestD = Infinity;
  for (const name of PALETTE_COLOURS) {
    const [pr, pg, pb] = rgb(PALETTE[name].ink.slice(1));
    const d = (r - pr) ** 2 + (g - pg) ** 2 + (b - pb) ** 2;
    if (d < bestD) [best, bestD] = [name, d];
  }
  return best;
}
