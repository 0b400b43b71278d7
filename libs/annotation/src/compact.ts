import simplify from 'simplify-js';
import type { AnnotationDocument, Point, Shape } from './document';

/**
 * Coordinates are kept to 1e-4 of the image side: a 0.4 px grid on a 4000 px photo (at
 * most 0.2 px off) and 0.16 px on the 1600 px screen image the editor draws on, finer than
 * a finger or a stylus can place anything, and a point then takes ~25 bytes of JSON
 * instead of ~50 at full double precision.
 */
export const COORD_STEP = 1e-4;

/**
 * Pen strokes are simplified (Ramer–Douglas–Peucker, the simplify-js package) to within
 * 5e-4 of the image's long side: 0.8 px on the 1600 px screen image, under a sixth of the
 * thinnest stroke (3 per 1000 px, palette.ts), so the line looks the same.
 */
export const PEN_TOLERANCE = 5e-4;

/** A value rounded to the coordinate grid (and back into 0..1). */
export function roundCoord(v: number): number {
  return Math.min(1, Math.max(0, Math.round(v * PER_UNIT) / PER_UNIT));
}
const PER_UNIT = Math.round(1 / COORD_STEP);

const roundPoint = (p: Point): Point => ({ x: roundCoord(p.x), y: roundCoord(p.y) });
/** Radii stay positive: the smallest ring is one grid step. */
const roundRadius = (r: number): number => Math.max(COORD_STEP, roundCoord(r));

/**
 * A pen stroke's points, simplified in pixels of `image` (so the tolerance is the same
 * along both axes of a non-square photo) and rounded; consecutive repeats are dropped.
 */
export function simplifyStroke(points: Point[], image: { width: number; height: number }): Point[] {
  const long = Math.max(image.width, image.height);
  const px = points.map((p) => ({ x: p.x * image.width, y: p.y * image.height }));
  const kept = px.length > 2 ? simplify(px, PEN_TOLERANCE * long, true) : px;
  const out: Point[] = [];
  for (const p of kept) {
    const q = roundPoint({ x: p.x / image.width, y: p.y / image.height });
    const last = out[out.length - 1];
    if (!last || last.x !== q.x || last.y !== q.y) out.push(q);
  }
  return out;
}

/** One shape on the coordinate grid (measuring lines excepted), pen strokes simplified. */
export function compactShape<S extends Shape>(shape: S, image: { width: number; height: number }): S {
  const s: Shape = shape;
  switch (s.kind) {
    case 'ring':
      return { ...s, centre: roundPoint(s.centre), rx: roundRadius(s.rx), ry: roundRadius(s.ry) } as S;
    case 'arrow':
      return { ...s, from: roundPoint(s.from), to: roundPoint(s.to) } as S;
    case 'ruler':
    case 'scale':
      // Measuring lines keep full precision: two points cost nothing, and a chain reading
      // recorded from the saved photo must equal the one the mechanic saw before saving.
      return s as S;
    case 'pen':
      return { ...s, points: simplifyStroke(s.points, image) } as S;
    case 'label':
      return { ...s, at: roundPoint(s.at) } as S;
    case 'blur':
      return { ...s, topLeft: roundPoint(s.topLeft), bottomRight: roundPoint(s.bottomRight) } as S;
  }
}

/** The document as it is stored: every coordinate on the grid, every stroke simplified. */
export function compactDocument(doc: AnnotationDocument): AnnotationDocument {
  return { ...doc, shapes: doc.shapes.map((s) => compactShape(s, doc.image)) };
}
