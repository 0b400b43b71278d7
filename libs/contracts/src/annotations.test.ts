import { AnnotationDocumentSchema, SaveAnnotationSchema } from './annotations';

const doc = (shapes: unknown[]) => ({ schemaVersion: 2, image: { width: 1600, height: 1200 }, shapes });
const ring = { id: 'a', kind: 'ring', colour: 'amber', width: 'medium', centre: { x: 0.5, y: 0.5 }, rx: 0.1, ry: 0.1 };

const issues = (value: unknown) => {
  const r = AnnotationDocumentSchema.safeParse(value);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

describe('annotation document schema', () => {
  it('accepts a document with every kind of shape', () => {
    const shapes = [
      ring,
      { id: 'b', kind: 'arrow', colour: 'cyan', width: 'bold', from: { x: 0, y: 0 }, to: { x: 1, y: 1 } },
      { id: 'c', kind: 'pen', colour: 'lime', width: 'thin', points: [{ x: 0.1, y: 0.1 }] },
      { id: 'd', kind: 'label', colour: 'white', width: 'thin', at: { x: 0.1, y: 0.1 }, text: 'Worn' },
      { id: 'e', kind: 'ruler', colour: 'ink', width: 'thin', from: { x: 0.1, y: 0.1 }, to: { x: 0.2, y: 0.1 }, pitches: 24 },
      { id: 'f', kind: 'scale', colour: 'magenta', width: 'thin', from: { x: 0.1, y: 0.2 }, to: { x: 0.2, y: 0.2 }, knownMm: 12.7 },
      { id: 'g', kind: 'blur', colour: 'amber', width: 'thin', topLeft: { x: 0.1, y: 0.2 }, bottomRight: { x: 0.2, y: 0.3 } },
    ];
    expect(issues(doc(shapes))).toEqual([]);
  });

  it('refuses an unknown kind with a clear message', () => {
    expect(issues(doc([{ ...ring, kind: 'star' }]))).toEqual(['shapes.0.kind: Unknown shape kind.']);
  });

  it('refuses points outside the image', () => {
    expect(issues(doc([{ ...ring, centre: { x: 1.2, y: 0.5 } }]))).toEqual(['shapes.0.centre.x: Points must lie on the image (0 to 1).']);
  });

  it('refuses colours outside the palette, extra fields, duplicate ids and old versions', () => {
    expect(issues(doc([{ ...ring, colour: '#ff0000' }]))[0]).toMatch(/^shapes.0.colour/);
    expect(issues(doc([{ ...ring, script: 'x' }]))[0]).toMatch(/^shapes.0: Unrecognized key/);
    expect(issues(doc([ring, ring]))).toEqual(['shapes: Shape ids must be unique.']);
    expect(issues({ ...doc([]), schemaVersion: 1 })).toEqual(['schemaVersion: This editor is out of date: reload the page.']);
  });

  it('needs the version a save was edited from', () => {
    expect(SaveAnnotationSchema.safeParse({ document: doc([]) }).success).toBe(false);
    expect(SaveAnnotationSchema.safeParse({ baseVersion: 0, document: doc([]) }).success).toBe(true);
  });
});
