import type { AnnotationDocument, Shape } from './document';
import { blurRegions, boundingBox, hitTest, toNormal, toPixel, translateShape } from './geometry';

const base = { colour: 'amber', width: 'medium' } as const;

describe('normalised ↔ pixel transforms', () => {
  // Upright sizes of the demo derivatives (landscape and portrait after EXIF rotation, CHECKS.md B.6 values 6/8 swap axes).
  const sizes = [
    { width: 1600, height: 1200 },
    { width: 1200, height: 1600 },
    { width: 2400, height: 1350 },
    { width: 320, height: 427 },
    { width: 1, height: 1 },
  ];
  it.each(sizes)('round-trips every grid point at %o', (size) => {
    for (let i = 0; i <= 10; i++) {
      for (let j = 0; j <= 10; j++) {
        const p = { x: i / 10, y: j / 10 };
        const back = toNormal(toPixel(p, size), size);
        expect(back.x).toBeCloseTo(p.x, 12);
        expect(back.y).toBeCloseTo(p.y, 12);
      }
    }
  });

  it('maps the same normalised point to the same place on a portrait and a landscape render of the same photo', () => {
    expect(toPixel({ x: 0.25, y: 0.5 }, { width: 1200, height: 1600 })).toEqual({ x: 300, y: 800 });
    expect(toPixel({ x: 0.25, y: 0.5 }, { width: 2400, height: 3200 })).toEqual({ x: 600, y: 1600 });
  });

  it('clamps pixels outside the image to its edge', () => {
    expect(toNormal({ x: -5, y: 2000 }, { width: 1000, height: 1000 })).toEqual({ x: 0, y: 1 });
  });
});

describe('bounding boxes and hit-testing', () => {
  const ring: Shape = { ...base, id: 'ring', kind: 'ring', centre: { x: 0.5, y: 0.5 }, rx: 0.1, ry: 0.2 };
  const arrow: Shape = { ...base, id: 'arrow', kind: 'arrow', from: { x: 0.1, y: 0.1 }, to: { x: 0.4, y: 0.1 } };
  const blur: Shape = { ...base, id: 'blur', kind: 'blur', topLeft: { x: 0.7, y: 0.7 }, bottomRight: { x: 0.9, y: 0.8 } };
  const doc: AnnotationDocument = { schemaVersion: 2, image: { width: 1000, height: 1000 }, shapes: [ring, arrow, blur] };
  const size = { width: 1000, height: 1000 };

  it('boxes a ring by its radii', () => {
    const b = boundingBox(ring);
    expect([b.x, b.y, b.width, b.height].map((v) => Number(v.toFixed(9)))).toEqual([0.4, 0.3, 0.2, 0.4]);
  });

  it('hits a ring on its outline but not in its empty middle', () => {
    expect(hitTest(doc, { x: 600, y: 500 }, size)?.id).toBe('ring'); // on the right of the outline (rx = 100 px)
    expect(hitTest(doc, { x: 500, y: 705 }, size)?.id).toBe('ring'); // near the bottom (ry = 200 px)
    expect(hitTest(doc, { x: 500, y: 500 }, size)).toBeNull();
  });

  it('hits a line within a finger’s tolerance and not beyond it', () => {
    expect(hitTest(doc, { x: 250, y: 120 }, size, 22)?.id).toBe('arrow');
    expect(hitTest(doc, { x: 250, y: 130 }, size, 22)).toBeNull();
    expect(hitTest(doc, { x: 800, y: 750 }, size)?.id).toBe('blur');
  });

  it('keeps a shape inside the image when it is dragged past the edge', () => {
    const moved = translateShape(arrow, 0.9, -0.5);
    expect(moved).toMatchObject({ from: { x: 0.7, y: 0 }, to: { x: 1, y: 0 } });
  });

  it('turns blur boxes into whole-pixel rectangles covering the box', () => {
    expect(blurRegions(doc, { width: 1600, height: 1200 })).toEqual([{ x: 1120, y: 840, width: 320, height: 120 }]);
  });
});
