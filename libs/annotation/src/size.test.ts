import { AnnotationDocumentSchema, MAX_DOCUMENT_PEN_POINTS, MAX_PEN_POINTS, MAX_SHAPES } from './schema';
import type { AnnotationDocument, Shape } from './document';
import { maxDocumentBytes, utf8Bytes, widestShapes } from './size';

/** The largest document that still passes the schema: widest pens up to the point budget, then the widest other shape. */
function largestValidDocument(): AnnotationDocument {
  const shapes = widestShapes();
  const pen = shapes.find((s) => s.kind === 'pen')!;
  const widestOther = shapes.filter((s) => s.kind !== 'pen').sort((a, b) => JSON.stringify(b).length - JSON.stringify(a).length)[0];
  const pt = { x: 0.0000012345678901234567, y: 0.0000012345678901234567 };
  // Ids stay 40 six-byte characters and unique: the shape's number written in control characters.
  const id = (i: number) => String.fromCharCode(...[...i.toString(16).padStart(40, '0')].map((c) => 0x0e + parseInt(c, 16)));
  const out: Shape[] = [];
  for (let i = 0; i < MAX_SHAPES; i++) {
    const pens = Math.floor(MAX_DOCUMENT_PEN_POINTS / MAX_PEN_POINTS);
    out.push(i < pens ? { ...pen, id: id(i), points: Array.from({ length: MAX_PEN_POINTS }, () => pt) } : { ...widestOther, id: id(i) });
  }
  return { schemaVersion: 2, image: { width: 65535, height: 65535 }, shapes: out };
}

describe('largest document', () => {
  // UTF-8 (RFC 3629): 1 to 4 bytes per code point.
  it('counts UTF-8 bytes', () => {
    expect([utf8Bytes('a'), utf8Bytes('é'), utf8Bytes('€'), utf8Bytes('🔧')]).toEqual([1, 2, 3, 4]);
  });

  it('bounds the JSON of the largest document the schema accepts, closely', () => {
    const doc = largestValidDocument();
    expect(AnnotationDocumentSchema.safeParse(doc).success).toBe(true);
    const bytes = utf8Bytes(JSON.stringify(doc));
    expect(bytes).toBeLessThanOrEqual(maxDocumentBytes());
    expect(bytes).toBeGreaterThan(maxDocumentBytes() * 0.97);
  });

  it('refuses one pen point past the document budget', () => {
    const doc = largestValidDocument();
    const last = doc.shapes[MAX_SHAPES - 1];
    doc.shapes[MAX_SHAPES - 1] = { kind: 'pen', id: last.id, colour: last.colour, width: last.width, points: [{ x: 0, y: 0 }] };
    expect(AnnotationDocumentSchema.safeParse(doc).error?.issues[0].message).toMatch(/at most 20000 pen points/);
  });
});
