import { compactDocument, compactShape, COORD_STEP, PEN_TOLERANCE, roundCoord, simplifyStroke } from './compact';
import type { AnnotationDocument, PenShape, Point } from './document';
import { distanceToSegment } from './geometry';

const base = { colour: 'amber', width: 'medium' } as const;
const image = { width: 4000, height: 3000 };

/** A hand-drawn wiggle: 1500 points at full double precision, like a long finger stroke. */
function longStroke(n = 1500, seed = 0.1234567891234567): Point[] {
  return Array.from({ length: n }, (_, i) => {
    const t = i / (n - 1);
    return { x: 0.1 + 0.8 * t + seed * 1e-9, y: 0.5 + 0.2 * Math.sin(t * 12) + 0.01 * Math.sin(t * 97) };
  });
}

const decimals = (v: number) => (String(v).split('.')[1] ?? '').length;

describe('coordinate precision', () => {
  // Arithmetic: a 1e-4 grid is 0.4 px on a 4000 px side, so rounding moves a point at most 0.2 px.
  it('rounds to 1e-4 of the image side, at most half a step away', () => {
    for (const v of [0, 1, 0.123456789, 0.99995, 0.00004999, 0.5000499999, 1 / 3]) {
      const r = roundCoord(v);
      expect(decimals(r)).toBeLessThanOrEqual(4);
      expect(Math.abs(r - v)).toBeLessThanOrEqual(COORD_STEP / 2 + 1e-12);
      expect(r).toBeGreaterThanOrEqual(0);
      expect(r).toBeLessThanOrEqual(1);
    }
    expect(COORD_STEP * image.width).toBeCloseTo(0.4, 12);
  });

  it('leaves measuring lines exact, so a reading does not move when the photo is saved', () => {
    const ruler = { ...base, id: 'm', kind: 'ruler', from: { x: 0.1, y: 0.5 }, to: { x: 0.60375, y: 0.5 }, pitches: 4 } as const;
    expect(compactShape(ruler, image)).toEqual(ruler);
    const arrow = compactShape({ ...base, id: 'a', kind: 'arrow', from: { x: 0.1, y: 0.5 }, to: { x: 0.60375, y: 0.123456 } }, image);
    expect(arrow).toMatchObject({ to: { x: 0.6038, y: 0.1235 } });
  });

  it('keeps a tiny ring a ring: radii never round to zero', () => {
    const ring = compactShape({ ...base, id: 'r', kind: 'ring', centre: { x: 0.123456, y: 0.654321 }, rx: 0.00001, ry: 0.2000001 }, image);
    expect(ring).toEqual({ ...base, id: 'r', kind: 'ring', centre: { x: 0.1235, y: 0.6543 }, rx: COORD_STEP, ry: 0.2 });
  });
});

describe('pen stroke simplification (Ramer–Douglas–Peucker through simplify-js)', () => {
  it('keeps every drawn point within the stated tolerance of the simplified line', () => {
    const raw = longStroke();
    const out = simplifyStroke(raw, image);
    expect(out.length).toBeLessThan(raw.length / 5);
    expect(out[0]).toEqual({ x: roundCoord(raw[0].x), y: roundCoord(raw[0].y) });
    expect(out.at(-1)).toEqual({ x: roundCoord(raw.at(-1)!.x), y: roundCoord(raw.at(-1)!.y) });
    // Douglas & Peucker (1973): no dropped point is farther than the tolerance from the kept polyline;
    // rounding adds at most half a grid step on each axis.
    const px = (p: Point) => ({ x: p.x * image.width, y: p.y * image.height });
    const limit = PEN_TOLERANCE * Math.max(image.width, image.height) + Math.hypot(image.width, image.height) * COORD_STEP;
    for (const p of raw) {
      const d = Math.min(...out.slice(1).map((q, i) => distanceToSegment(px(p), px(out[i]), px(q))));
      expect(d).toBeLessThanOrEqual(limit);
    }
  });

  it('leaves a short or straight stroke its ends, and a tap one point', () => {
    const line = Array.from({ length: 50 }, (_, i) => ({ x: 0.1 + i * 0.01, y: 0.3 }));
    expect(simplifyStroke(line, image)).toEqual([
      { x: 0.1, y: 0.3 },
      { x: 0.59, y: 0.3 },
    ]);
    expect(
      simplifyStroke(
        [
          { x: 0.2, y: 0.2 },
          { x: 0.20000001, y: 0.2 },
        ],
        image,
      ),
    ).toEqual([{ x: 0.2, y: 0.2 }]);
  });

  it('makes a ~170 kB document of long strokes a fraction of its size', () => {
    const shapes: PenShape[] = [0, 1, 2].map((i) => ({ ...base, id: `p${i}`, kind: 'pen', points: longStroke(1100, i / 7) }));
    const doc: AnnotationDocument = { schemaVersion: 2, image, shapes };
    const before = JSON.stringify(doc).length;
    const after = JSON.stringify(compactDocument(doc)).length;
    expect(before).toBeGreaterThan(150_000);
    expect(after).toBeLessThan(before / 10);
  });
});
