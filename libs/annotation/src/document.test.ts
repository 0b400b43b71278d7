import { ANNOTATION_SCHEMA_VERSION, emptyDocument, migrateDocument } from './document';

describe('annotation document versions', () => {
  it('refuses unknown or future schema versions instead of guessing', () => {
    expect(() => migrateDocument({ schemaVersion: 99, image: { width: 1, height: 1 }, shapes: [] })).toThrow(/schemaVersion 99/);
    expect(() => migrateDocument({ schemaVersion: 0, image: { width: 1, height: 1 }, shapes: [] })).toThrow(/schemaVersion 0/);
    expect(() => migrateDocument(null)).toThrow(TypeError);
    expect(() => migrateDocument({ schemaVersion: 2, shapes: [] })).toThrow(/image size/);
  });

  it('keeps a current document as it is', () => {
    const doc = {
      ...emptyDocument(4000, 3000),
      shapes: [{ id: 'a', kind: 'ring', colour: 'cyan', width: 'bold', centre: { x: 0.5, y: 0.5 }, rx: 0.1, ry: 0.1 }],
    };
    expect(migrateDocument(JSON.parse(JSON.stringify(doc)))).toEqual(doc);
  });

  it('migrates a version-1 document: free hex colours become the nearest palette ink, strokes become medium', () => {
    const v1 = {
      schemaVersion: 1,
      image: { width: 1600, height: 1200 },
      shapes: [
        { id: 'r', kind: 'ring', colour: '#ff0000', centre: { x: 0.5, y: 0.5 }, rx: 0.1, ry: 0.1 },
        { id: 'a', kind: 'arrow', colour: '#00ffff', from: { x: 0.1, y: 0.1 }, to: { x: 0.2, y: 0.2 } },
        { id: 'l', kind: 'label', colour: '#000', at: { x: 0.3, y: 0.3 }, text: 'crack' },
      ],
    };
    const doc = migrateDocument(v1);
    expect(doc.schemaVersion).toBe(ANNOTATION_SCHEMA_VERSION);
    // Red is nearest magenta (#FF3FA4) in RGB distance; cyan stays cyan; an unparsable colour falls back to amber.
    expect(doc.shapes.map((s) => [s.id, s.colour, s.width])).toEqual([
      ['r', 'magenta', 'medium'],
      ['a', 'cyan', 'medium'],
      ['l', 'amber', 'medium'],
    ]);
    expect(doc.shapes[1]).toMatchObject({ from: { x: 0.1, y: 0.1 }, to: { x: 0.2, y: 0.2 } });
  });
});
