import type { AnnotationDocument } from './document';
import { boundingBox, clamp01, type Box } from './geometry';

/**
 * Where the photo's subject is, as far as the mechanic told us: the box around every mark
 * they drew (rings, arrows, pen, labels, rulers, scales), normalised to the upright image.
 * Blur boxes hide things rather than point at them, so they do not count. Null without marks.
 */
export function marksBox(doc: AnnotationDocument): Box | null {
  const boxes = doc.shapes.filter((s) => s.kind !== 'blur').map(boundingBox);
  if (!boxes.length) return null;
  const x0 = clamp01(Math.min(...boxes.map((b) => b.x)));
  const y0 = clamp01(Math.min(...boxes.map((b) => b.y)));
  const x1 = clamp01(Math.max(...boxes.map((b) => b.x + b.width)));
  const y1 = clamp01(Math.max(...boxes.map((b) => b.y + b.height)));
  return { x: x0, y: y0, width: x1 - x0, height: y1 - y0 };
}
