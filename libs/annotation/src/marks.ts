import { formatMm, mmPerPixel, pixelLength } from './calibration';
import type { AnnotationDocument, Point, Shape } from './document';
import { fontPx } from './palette';

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

/** A caption's box in pixels: top-left corner and size. */
export interface CaptionRect {
  x: number;
  y: number;
  width: number;
  height: number;
}

const within = (v: number, lo: number, hi: number) => Math.min(Math.max(v, lo), Math.max(lo, hi));

/** The caption box for `text` centred on `at`, moved as little as needed to lie inside the image. */
export function placeCaption(text: string, at: Point, size: { width: number; height: number }, font = fontPx(size)): CaptionRect {
  const { width, height } = captionBox(text, font);
  return { x: within(at.x - width / 2, 0, size.width - width), y: within(at.y - height / 2, 0, size.height - height), width, height };
}

const overlaps = (a: CaptionRect, b: CaptionRect) => a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

/** Where a line's caption may go, best first: above its middle, below, then further out each way. */
function lineCaptionSpots(from: Point, to: Point, font: number, step: number): Point[] {
  const above = captionAnchor(from, to, font);
  const below = { x: above.x, y: above.y + 2.2 * font };
  const spots = [above, below];
  for (let k = 1; k <= 4; k++) spots.push({ x: above.x, y: above.y - k * step }, { x: below.x, y: below.y + k * step });
  return spots;
}

/**
 * Every caption of the document in pixels of an image of `size`, inside the image: labels
 * where the mechanic put them, then ruler and scale captions off their line's middle, each
 * moved to the first spot that overlaps no caption placed before it. The SVG renderer and
 * the editor both draw from this, so the server render, the PDF and the screen agree.
 */
export function captionLayout(doc: AnnotationDocument, size: { width: number; height: number }): Map<string, { text: string; box: CaptionRect }> {
  const font = fontPx(size);
  const out = new Map<string, { text: string; box: CaptionRect }>();
  const px = (p: Point) => ({ x: p.x * size.width, y: p.y * size.height });
  for (const s of doc.shapes) if (s.kind === 'label') out.set(s.id, { text: s.text, box: placeCaption(s.text, px(s.at), size, font) });
  for (const s of doc.shapes) {
    if (s.kind !== 'ruler' && s.kind !== 'scale') continue;
    const text = captionOf(doc, s) ?? '';
    const placed = [...out.values()].map((c) => c.box);
    const spots = lineCaptionSpots(px(s.from), px(s.to), font, Math.ceil(font * 1.5)).map((at) => placeCaption(text, at, size, font));
    out.set(s.id, { text, box: spots.find((b) => !placed.some((p) => overlaps(b, p))) ?? spots[0] });
  }
  return out;
}

/** A label's anchor moved so its caption lies inside the image (normalised in and out). */
export function keepLabelInside<S extends Shape>(shape: S, size: { width: number; height: number }): S {
  if (shape.kind !== 'label') return shape;
  const b = placeCaption(shape.text, { x: shape.at.x * size.width, y: shape.at.y * size.height }, size);
  return { ...shape, at: { x: (b.x + b.width / 2) / size.width, y: (b.y + b.height / 2) / size.height } };
}
