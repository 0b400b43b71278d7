import { emptyDocument, migrateDocument, mmPerPixel, pixelLength, rulerLengthMm, type AnnotationDocument } from './index';

describe('annotation document', () => {
  it('refuses unknown schema versions instead of guessing', () => {
    expect(() => migrateDocument({ schemaVersion: 99, image: { width: 1, height: 1 }, shapes: [] })).toThrow(/schemaVersion 99/);
    expect(() => migrateDocument(null)).toThrow(TypeError);
  });

  it('keeps a current document as it is', () => {
    const doc = emptyDocument(4000, 3000);
    expect(migrateDocument(JSON.parse(JSON.stringify(doc)))).toEqual(doc);
  });
});

describe('calibrated ruler', () => {
  // A 3-4-5 right triangle: the Pythagorean theorem gives an exact 500 px hypotenuse on a 1000×1000 image.
  it('measures pixel lengths on the upright image', () => {
    expect(pixelLength({ x: 0, y: 0 }, { x: 0.3, y: 0.4 }, { width: 1000, height: 1000 })).toBeCloseTo(500, 9);
  });

  // Worked example (arithmetic): a scale line of 600 px marked as 12.7 mm (one chain pitch, ISO 606 / ISO 9633
  // 1/2 in pitch) gives 12.7/600 mm per px; a ruler of 300 px is then 6.35 mm.
  const doc: AnnotationDocument = {
    ...emptyDocument(1200, 800),
    shapes: [
      { id: 's', colour: '#fff', kind: 'scale', from: { x: 0.25, y: 0.5 }, to: { x: 0.75, y: 0.5 }, knownMm: 12.7 },
      { id: 'r', colour: '#fff', kind: 'ruler', from: { x: 0.5, y: 0.1 }, to: { x: 0.5, y: 0.475 } },
    ],
  };

  it('turns a ruler into millimetres once the photo has a scale', () => {
    expect(mmPerPixel(doc)).toBeCloseTo(12.7 / 600, 12);
    expect(rulerLengthMm(doc, 'r')).toBeCloseTo(6.35, 9);
  });

  it('gives no length while there is no scale reference', () => {
    expect(rulerLengthMm({ ...doc, shapes: doc.shapes.filter((s) => s.kind !== 'scale') }, 'r')).toBeNull();
  });
});
