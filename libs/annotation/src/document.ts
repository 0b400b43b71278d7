/**
 * The annotation document: a versioned list of shapes over one photo, in coordinates
 * normalised to the upright image (0..1 on each axis), so the editor and the server
 * renderer draw the same thing at any resolution.
 */
export const ANNOTATION_SCHEMA_VERSION = 1;

export interface Point {
  x: number;
  y: number;
}

interface ShapeBase {
  id: string;
  colour: string;
}

export type Shape =
  | (ShapeBase & { kind: 'ring'; centre: Point; rx: number; ry: number })
  | (ShapeBase & { kind: 'arrow'; from: Point; to: Point })
  | (ShapeBase & { kind: 'pen'; points: Point[] })
  | (ShapeBase & { kind: 'label'; at: Point; text: string })
  | (ShapeBase & { kind: 'ruler'; from: Point; to: Point })
  | (ShapeBase & { kind: 'scale'; from: Point; to: Point; knownMm: number })
  | (ShapeBase & { kind: 'blur'; topLeft: Point; bottomRight: Point });

export interface AnnotationDocument {
  schemaVersion: typeof ANNOTATION_SCHEMA_VERSION;
  /** Pixel size of the upright image the shapes were drawn on; needed to turn lengths into mm. */
  image: { width: number; height: number };
  shapes: Shape[];
}

export const emptyDocument = (width: number, height: number): AnnotationDocument => ({
  schemaVersion: ANNOTATION_SCHEMA_VERSION,
  image: { width, height },
  shapes: [],
});

/**
 * Reads a stored document of any known version and returns the current version.
 * Unknown or future versions are refused rather than guessed at.
 */
export function migrateDocument(raw: unknown): AnnotationDocument {
  const doc = raw as Partial<AnnotationDocument> | null;
  if (!doc || typeof doc !== 'object') throw new TypeError('Annotation document must be an object');
  if (doc.schemaVersion !== ANNOTATION_SCHEMA_VERSION) {
    throw new RangeError(`Unsupported annotation schemaVersion ${String(doc.schemaVersion)}`);
  }
  if (!doc.image || !(doc.image.width > 0) || !(doc.image.height > 0)) throw new RangeError('Annotation document needs the image size');
  return { schemaVersion: ANNOTATION_SCHEMA_VERSION, image: doc.image, shapes: Array.isArray(doc.shapes) ? doc.shapes : [] };
}
