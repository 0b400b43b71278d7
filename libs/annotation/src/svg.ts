import type { AnnotationDocument, Point, Shape } from './document';
import { toPixel, type Size } from './geometry';
import { arrowHead, arrowShaftEnd, captionLayout, endTicks, placeCaption, type CaptionRect } from './marks';
import { fontPx, outlinePx, PALETTE, strokePx } from './palette';

const f = (n: number) => Number(n.toFixed(2));
const pts = (list: Point[]) => list.map((p) => `${f(p.x)},${f(p.y)}`).join(' ');
const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/** Draws one path twice: the outline colour wide underneath, then the ink. */
function twice(el: (stroke: string, width: number) => string, shape: Shape, size: Size): string {
  const c = PALETTE[shape.colour];
  return el(c.outline, outlinePx(shape.width, size)) + el(c.ink, strokePx(shape.width, size));
}

function line(a: Point, b: Point, dash = ''): (s: string, w: number) => string {
  return (s, w) => `<line x1="${f(a.x)}" y1="${f(a.y)}" x2="${f(b.x)}" y2="${f(b.y)}" stroke="${s}" stroke-width="${f(w)}"${dash}/>`;
}

/** A caption in its laid-out box (inside the image, clear of the other captions). */
function caption(text: string, box: CaptionRect, shape: Shape, size: Size): string {
  const font = fontPx(size);
  const c = PALETTE[shape.colour];
  const cx = box.x + box.width / 2;
  const cy = box.y + box.height / 2;
  return (
    `<rect x="${f(box.x)}" y="${f(box.y)}" width="${box.width}" height="${box.height}" rx="${f(font * 0.25)}" fill="${c.ink}" stroke="${c.outline}" stroke-width="${f(font * 0.08)}"/>` +
    `<text x="${f(cx)}" y="${f(cy + font * 0.35)}" font-family="Inter, DejaVu Sans, sans-serif" font-size="${font}" font-weight="600" text-anchor="middle" fill="${c.outline}">${esc(text)}</text>`
  );
}

type Captions = ReturnType<typeof captionLayout>;

function lineMark(shape: Shape & { from: Point; to: Point }, size: Size, dashed: boolean, captions: Captions): string {
  const a = toPixel(shape.from, size);
  const b = toPixel(shape.to, size);
  const w = strokePx(shape.width, size);
  const dash = dashed ? ` stroke-dasharray="${f(3 * w)} ${f(2 * w)}"` : '';
  const ticks = endTicks(a, b, w)
    .map(([p, q]) => twice(line(p, q), shape, size))
    .join('');
  const c = captions.get(shape.id);
  const cap = c ? caption(c.text, c.box, shape, size) : '';
  return twice(line(a, b, dash), shape, size) + ticks + cap;
}

/** SVG markup of one shape over an image of `size` pixels (blur boxes draw nothing: the pixels are redacted). */
export function shapeToSvg(doc: AnnotationDocument, shape: Shape, size: Size, captions: Captions = captionLayout(doc, size)): string {
  switch (shape.kind) {
    case 'ring': {
      const c = toPixel(shape.centre, size);
      const rx = f(shape.rx * size.width);
      const ry = f(shape.ry * size.height);
      return twice((s, w) => `<ellipse cx="${f(c.x)}" cy="${f(c.y)}" rx="${rx}" ry="${ry}" fill="none" stroke="${s}" stroke-width="${f(w)}"/>`, shape, size);
    }
    case 'arrow': {
      const a = toPixel(shape.from, size);
      const b = toPixel(shape.to, size);
      const w = strokePx(shape.width, size);
      const head = arrowHead(a, b, w);
      const headSvg = (s: string, sw: number) =>
        `<polygon points="${pts(head)}" fill="${PALETTE[shape.colour].ink}" stroke="${s}" stroke-width="${f(sw - w)}"/>`;
      return twice(line(a, arrowShaftEnd(a, b, w)), shape, size) + headSvg(PALETTE[shape.colour].outline, outlinePx(shape.width, size));
    }
    case 'pen':
      return twice(
        (s, w) => `<polyline points="${pts(shape.points.map((p) => toPixel(p, size)))}" fill="none" stroke="${s}" stroke-width="${f(w)}"/>`,
        shape,
        size,
      );
    case 'label':
      return caption(shape.text, captions.get(shape.id)?.box ?? placeCaption(shape.text, toPixel(shape.at, size), size), shape, size);
    case 'ruler':
      return lineMark(shape, size, false, captions);
    case 'scale':
      return lineMark(shape, size, true, captions);
    case 'blur':
      return '';
  }
}

/**
 * The whole document as an SVG of exactly `size` pixels, transparent where nothing
 * is drawn, for compositing over the upright image of that size.
 */
export function renderSvg(doc: AnnotationDocument, size: Size): string {
  const captions = captionLayout(doc, size);
  const body = doc.shapes.map((s) => shapeToSvg(doc, s, size, captions)).join('');
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${size.width}" height="${size.height}" viewBox="0 0 ${size.width} ${size.height}">` +
    `<g stroke-linecap="round" stroke-linejoin="round">${body}</g></svg>`
  );
}
