import type { AnnotationDocument, Point } from './document';

/** Length in image pixels of a line given in normalised coordinates. */
export function pixelLength(from: Point, to: Point, image: { width: number; height: number }): number {
  return Math.hypot((to.x - from.x) * image.width, (to.y - from.y) * image.height);
}

/**
 * Millimetres per pixel from the document's scale reference (a line of known length
 * drawn over something measured, e.g. a ruler in the shot), or null when there is none.
 */
export function mmPerPixel(doc: AnnotationDocument): number | null {
  const scale = doc.shapes.find((s) => s.kind === 'scale');
  if (!scale || scale.kind !== 'scale') return null;
  const px = pixelLength(scale.from, scale.to, doc.image);
  if (px === 0 || !(scale.knownMm > 0)) return null;
  return scale.knownMm / px;
}

/** A ruler's measured length in mm, or null while the photo has no scale. */
export function rulerLengthMm(doc: AnnotationDocument, rulerId: string): number | null {
  const ruler = doc.shapes.find((s) => s.id === rulerId);
  const scale = mmPerPixel(doc);
  if (!ruler || ruler.kind !== 'ruler' || scale === null) return null;
  return pixelLength(ruler.from, ruler.to, doc.image) * scale;
}
