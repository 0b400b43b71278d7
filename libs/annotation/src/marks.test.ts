import type { AnnotationDocument, Shape } from './document';
import { hitTest } from './geometry';
import { captionLayout, keepLabelInside, placeCaption } from './marks';
import { fontPx } from './palette';
import { renderSvg } from './svg';

const base = { colour: 'amber', width: 'medium' } as const;
const size = { width: 1600, height: 1200 };
const inside = (b: { x: number; y: number; width: number; height: number }, s = size) =>
  b.x >= 0 && b.y >= 0 && b.x + b.width <= s.width && b.y + b.height <= s.height;
const overlap = (a: { x: number; y: number; width: number; height: number }, b: typeof a) =>
  a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

describe('captions stay inside the image', () => {
  const label = (id: string, x: number, y: number, text = 'Cracked weld, replace'): Shape => ({ ...base, id, kind: 'label', at: { x, y }, text });

  it.each([
    ['right edge', 0.99, 0.5],
    ['left edge', 0.01, 0.5],
    ['top-left corner', 0, 0],
    ['bottom-right corner', 1, 1],
  ])('a label at the %s is drawn inside, at every render size', (_, x, y) => {
    const doc: AnnotationDocument = { schemaVersion: 2, image: size, shapes: [label('l', x, y)] };
    for (const s of [size, { width: 320, height: 240 }, { width: 1000, height: 750 }]) {
      const box = captionLayout(doc, s).get('l')!.box;
      expect(inside(box, s)).toBe(true);
    }
  });

  it('leaves a label in the middle where it was put', () => {
    const box = placeCaption('Worn', { x: 800, y: 600 }, size);
    expect(box.x + box.width / 2).toBeCloseTo(800, 9);
    expect(box.y + box.height / 2).toBeCloseTo(600, 9);
  });

  it('writes the server render’s caption rectangle inside the image', () => {
    const doc: AnnotationDocument = { schemaVersion: 2, image: size, shapes: [label('l', 1, 0.5)] };
    const m = /<rect x="([\d.]+)" y="([\d.]+)" width="(\d+)" height="(\d+)"/.exec(renderSvg(doc, size))!;
    const [x, y, w, h] = m.slice(1).map(Number);
    expect(inside({ x, y, width: w, height: h })).toBe(true);
  });

  it('moves a label placed at the edge in the editor, and hit-tests it where it is drawn', () => {
    const moved = keepLabelInside(label('l', 1, 0.5), size);
    if (moved.kind !== 'label') throw new Error('label expected');
    expect(moved.at.x).toBeLessThan(1);
    const doc: AnnotationDocument = { schemaVersion: 2, image: size, shapes: [label('l', 1, 0.5)] };
    const box = captionLayout(doc, size).get('l')!.box;
    expect(hitTest(doc, { x: box.x + 10, y: box.y + box.height / 2 }, size, 0)?.id).toBe('l');
  });

  it('keeps a ruler’s caption inside when the ruler runs along the top edge', () => {
    const doc: AnnotationDocument = {
      schemaVersion: 2,
      image: size,
      shapes: [{ ...base, id: 'r', kind: 'ruler', from: { x: 0.2, y: 0 }, to: { x: 0.6, y: 0 } }],
    };
    expect(inside(captionLayout(doc, size).get('r')!.box)).toBe(true);
  });
});

describe('scale and measurement captions do not overlap', () => {
  it('moves the ruler’s caption off the scale’s when the two lines lie close together', () => {
    const doc: AnnotationDocument = {
      schemaVersion: 2,
      image: size,
      shapes: [
        { ...base, id: 's', kind: 'scale', from: { x: 0.2, y: 0.5 }, to: { x: 0.5, y: 0.5 }, knownMm: 25.4 },
        { ...base, id: 'r', kind: 'ruler', from: { x: 0.22, y: 0.51 }, to: { x: 0.52, y: 0.51 } },
        { ...base, id: 'l', kind: 'label', at: { x: 0.37, y: 0.46 }, text: 'Chain' },
      ],
    };
    const layout = captionLayout(doc, size);
    const [s, r, l] = ['s', 'r', 'l'].map((id) => layout.get(id)!.box);
    expect(overlap(s, r)).toBe(false);
    expect(overlap(s, l)).toBe(false);
    expect(overlap(r, l)).toBe(false);
    // The scale's caption is also kept near its line: within three caption heights of the middle.
    expect(Math.abs(s.y + s.height / 2 - 600)).toBeLessThan(3 * 1.4 * fontPx(size));
  });
});
