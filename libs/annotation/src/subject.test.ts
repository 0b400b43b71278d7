import type { AnnotationDocument, Shape } from './document';
import { marksBox } from './subject';

const base = { colour: 'amber', width: 'medium' } as const;
const doc = (shapes: Shape[]): AnnotationDocument => ({ schemaVersion: 2, image: { width: 1600, height: 1000 }, shapes });
const round = (b: ReturnType<typeof marksBox>) => b && [b.x, b.y, b.width, b.height].map((v) => Number(v.toFixed(9)));

describe('the marks’ box: where the mechanic pointed', () => {
  const ring: Shape = { ...base, id: 'r', kind: 'ring', centre: { x: 0.2, y: 0.5 }, rx: 0.1, ry: 0.15 };
  const arrow: Shape = { ...base, id: 'a', kind: 'arrow', from: { x: 0.35, y: 0.2 }, to: { x: 0.25, y: 0.4 } };
  const blur: Shape = { ...base, id: 'b', kind: 'blur', topLeft: { x: 0.8, y: 0.8 }, bottomRight: { x: 0.95, y: 0.95 } };
  const ringAtEdge: Shape = { ...base, id: 'e', kind: 'ring', centre: { x: 0.02, y: 0.5 }, rx: 0.1, ry: 0.1 };

  it.each([
    ['no shapes', [], null],
    ['a ring alone: its bounding corners', [ring], [0.1, 0.35, 0.2, 0.3]],
    ['a ring and an arrow: the union', [ring, arrow], [0.1, 0.2, 0.25, 0.45]],
    ['a blur box hides, it does not point: left out', [ring, blur], [0.1, 0.35, 0.2, 0.3]],
    ['only a blur box: no subject', [blur], null],
    ['a ring reaching past the edge is clamped to the image', [ringAtEdge], [0, 0.4, 0.12, 0.2]],
  ] as const)('%s', (_, shapes, expected) => {
    expect(round(marksBox(doc([...shapes])))).toEqual(expected);
  });
});
