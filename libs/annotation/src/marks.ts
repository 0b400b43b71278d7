import { formatMm, mmPerPixel, pixelLength } from './calibration';
import type { AnnotationDocument, Point, Shape } from './document';

/**
 * Pixel geometry shared by the SVG renderer and the canvas editor, so both
 * draw arrow heads, ruler ticks and captions in exactly the same place.
 */

/** Arrow head triangle at `to` (pixels): length 4.5 stroke widths, half-width 2.5. */
export function arrowHead(from: Point, to: Point, stroke: number): [Point, Point, Point] {
  const len = Math.hypot(to.x - from.x, to.y - from.y) || 1;
  const ux = (to.x - from.x) / len;
  const uy = (to.y - from.y) / len;
  const back = { x: to.x - ux * 4.5 * stroke, y: to.y - uy * 4.5 * stroke };
  const half = 2.5 * stroke;
  return [to, { x: back.x - uy * half, y: back.y + ux * half }, { x: back.x + uy * half, y: back.y - ux * half }];
}

/** The arrow shaft ends where the head begins, so a wide stroke does not poke through the tip. */
export function arrowShaftEnd(from: Point, to: Point, stroke: number): Point {
  const len = Math.hypot(to.x - from.x, to.y - from.y) || 1;
  const k = Math.max(0, len - 4 * stroke) / len;
  return { x: from.x + (to.x - from.x) * k, y: from.y + (to.y - from.y) * k };
}

/** Perpendicular end ticks of a ruler or scale line (pixels), 3 stroke widths each side. */
export function endTicks(from: Point, to: Point, stroke: number): [Point, Point][] {
  const len = Math.hypot(to.x - from.x, to.y - from.y) || 1;
  const nx = (-(to.y - from.y) / len) * 3 * stroke;
  const ny = ((to.x - from.x) / len) * 3 * stroke;
  return [from, to].map(
    (p) =>
      [
        { x: p.x - nx, y: p.y - ny },
        { x: p.x + nx, y: p.y + ny },
      ] as [Point, Point],
  );
}

/** The caption drawn beside a ruler or scale line, or on a label. */
export function captionOf(doc: AnnotationDocument, shape: Shape): string | null {
  switch (shape.kind) {
    case 'label':
      return shape.text;
    case 'scale':
      return `= ${formatMm(shape.knownMm)}`;
    case 'ruler': {
      const k = mmPerPixel(doc);
      if (k === null) return 'no scale';
      const mm = pixelLength(shape.from, shape.to, doc.image) * k;
      return shape.pitches ? `${formatMm(mm)} / ${shape.pitches} p` : formatMm(mm);
    }
    case 'ring':
    case 'arrow':
    case 'pen':
    case 'blur':
      return null;
  }
}

/** Where a line's caption sits: centred just off the middle of the line, on the upper side. */
export function captionAnchor(from: Point, to: Point, font: number): Point {
  const mid = { x: (from.x + to.x) / 2, y: (from.y + to.y) / 2 };
  return { x: mid.x, y: mid.y - 1.1 * font };
}

/** Width of a caption box for `text` at `font` px: a fixed advance per character keeps both renderers in step. */
export function captionBox(text: string, font: number): { width: number; height: number } {
  return { width: Math.ceil(text.length * font * 0.6 + font * 0.8), height: Math.ceil(font * 1.4) };
}
