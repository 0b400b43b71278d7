import type { AnnotationDocument, Point, Shape } from './document';
import { placeCaption } from './marks';

export interface Size {
  width: number;
  height: number;
}

export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Normalised (0..1 of the upright image) → pixels of an image of `size`. */
export function toPixel(p: Point, size: Size): Point {
  return { x: p.x * size.width, y: p.y * size.height };
}

/** Pixels of an image of `size` → normalised, clamped to the image. */
export function toNormal(p: Point, size: Size): Point {
  return { x: clamp01(p.x / size.width), y: clamp01(p.y / size.height) };
}

export const clamp01 = (v: number): number => Math.min(1, Math.max(0, v));

/** The points that define a shape (rings: their bounding corners). */
function outlinePoints(shape: Shape): Point[] {
  switch (shape.kind) {
    case 'ring':
      return [
        { x: shape.centre.x - shape.rx, y: shape.centre.y - shape.ry },
        { x: shape.centre.x + shape.rx, y: shape.centre.y + shape.ry },
      ];
    case 'arrow':
    case 'ruler':
    case 'scale':
      return [shape.from, shape.to];
    case 'pen':
      return shape.points;
    case 'label':
      return [shape.at];
    case 'blur':
      return [shape.topLeft, shape.bottomRight];
  }
}

/** Axis-aligned bounding box of a shape, normalised (labels: their anchor only). */
export function boundingBox(shape: Shape): Box {
  const pts = outlinePoints(shape);
  const xs = pts.map((p) => p.x);
  const ys = pts.map((p) => p.y);
  const x = Math.min(...xs);
  const y = Math.min(...ys);
  return { x, y, width: Math.max(...xs) - x, height: Math.max(...ys) - y };
}

/** Distance in pixels from p to the segment a–b (all in pixels). */
export function distanceToSegment(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

/** Approximate distance in pixels from p to an ellipse's outline (radial, exact for circles). */
function distanceToEllipse(p: Point, c: Point, rx: number, ry: number): number {
  const dx = p.x - c.x;
  const dy = p.y - c.y;
  if (rx <= 0 || ry <= 0) return Math.hypot(dx, dy);
  const r = Math.hypot(dx / rx, dy / ry);
  if (r === 0) return Math.min(rx, ry);
  return Math.abs(Math.hypot(dx, dy) * (1 - 1 / r));
}

const inBox = (p: Point, x0: number, y0: number, x1: number, y1: number, pad: number) =>
  p.x >= x0 - pad && p.x <= x1 + pad && p.y >= y0 - pad && p.y <= y1 + pad;

/** Whether a point in pixels touches a shape, within `tolerancePx` (a finger needs ~22 px). */
export function hitsShape(shape: Shape, pointPx: Point, size: Size, tolerancePx: number): boolean {
  const px = (p: Point) => toPixel(p, size);
  switch (shape.kind) {
    case 'ring':
      return distanceToEllipse(pointPx, px(shape.centre), shape.rx * size.width, shape.ry * size.height) <= tolerancePx;
    case 'arrow':
    case 'ruler':
    case 'scale':
      return distanceToSegment(pointPx, px(shape.from), px(shape.to)) <= tolerancePx;
    case 'pen':
      return (
        shape.points.some((p, i) => i > 0 && distanceToSegment(pointPx, px(shape.points[i - 1]), px(p)) <= tolerancePx) ||
        (shape.points.length === 1 && Math.hypot(pointPx.x - px(shape.points[0]).x, pointPx.y - px(shape.points[0]).y) <= tolerancePx)
      );
    case 'label': {
      // Where the caption is drawn (kept inside the image), not just its anchor.
      const b = placeCaption(shape.text, px(shape.at), size);
      return inBox(pointPx, b.x, b.y, b.x + b.width, b.y + b.height, tolerancePx);
    }
    case 'blur': {
      const tl = px(shape.topLeft);
      const br = px(shape.bottomRight);
      return inBox(pointPx, tl.x, tl.y, br.x, br.y, tolerancePx);
    }
  }
}

/** The topmost shape under a point in pixels, or null. Later shapes are drawn on top. */
export function hitTest(doc: AnnotationDocument, pointPx: Point, size: Size, tolerancePx = 22): Shape | null {
  for (let i = doc.shapes.length - 1; i >= 0; i--) {
    if (hitsShape(doc.shapes[i], pointPx, size, tolerancePx)) return doc.shapes[i];
  }
  return null;
}

/** Moves a shape by a normalised offset, keeping every point inside the image. */
export function translateShape<S extends Shape>(shape: S, dx: number, dy: number): S {
  const b = boundingBox(shape);
  const ox = Math.min(1 - (b.x + b.width), Math.max(-b.x, dx));
  const oy = Math.min(1 - (b.y + b.height), Math.max(-b.y, dy));
  const mv = (p: Point): Point => ({ x: p.x + ox, y: p.y + oy });
  switch (shape.kind) {
    case 'ring':
      return { ...shape, centre: mv(shape.centre) };
    case 'arrow':
    case 'ruler':
    case 'scale':
      return { ...shape, from: mv(shape.from), to: mv(shape.to) };
    case 'pen':
      return { ...shape, points: shape.points.map(mv) };
    case 'label':
      return { ...shape, at: mv(shape.at) };
    case 'blur':
      return { ...shape, topLeft: mv(shape.topLeft), bottomRight: mv(shape.bottomRight) };
  }
  return shape;
}

/** Blur boxes as whole-pixel rectangles of an image of `size` (at least 1 px), for redaction. */
export function blurRegions(doc: AnnotationDocument, size: Size): Box[] {
  return doc.shapes.flatMap((s) => {
    if (s.kind !== 'blur') return [];
    const x0 = Math.floor(Math.min(s.topLeft.x, s.bottomRight.x) * size.width);
    const y0 = Math.floor(Math.min(s.topLeft.y, s.bottomRight.y) * size.height);
    const x1 = Math.ceil(Math.max(s.topLeft.x, s.bottomRight.x) * size.width);
    const y1 = Math.ceil(Math.max(s.topLeft.y, s.bottomRight.y) * size.height);
    const x = Math.min(x0, size.width - 1);
    const y = Math.min(y0, size.height - 1);
    return [{ x, y, width: Math.max(1, Math.min(x1, size.width) - x), height: Math.max(1, Math.min(y1, size.height) - y) }];
  });
}
