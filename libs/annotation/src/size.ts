import type { Shape } from './document';
import { ANNOTATION_SCHEMA_VERSION, MAX_DOCUMENT_PEN_POINTS, MAX_ID_CHARS, MAX_IMAGE_SIDE, MAX_LABEL_CHARS, MAX_PITCHES, MAX_SHAPES } from './schema';

/**
 * The largest document the schema accepts, in bytes of compact JSON (JSON.stringify, as
 * every client sends it), worked out from the schema's limits rather than guessed, so the
 * API's body limit for a save follows the schema when a limit changes.
 *
 * Worst cases: a string character costs at most 6 bytes (a control character is written
 * `\u0001`; any other UTF-16 unit is 3 bytes of UTF-8 at most); a number in 0..1 at most 24
 * characters (`0.0000012345678901234567`: 17 significant digits after five zeros, the
 * longest plain form JavaScript prints before switching to `1e-7` style); an integer
 * within the limits its own digits.
 */
const WIDEST_UNIT = 0.0000012345678901234567;
const WIDEST_CHAR = '\u0001';

/** UTF-8 length of a string (the lib stays free of DOM and Node globals). */
export function utf8Bytes(s: string): number {
  let n = 0;
  for (const ch of s) {
    const c = ch.codePointAt(0) ?? 0;
    n += c < 0x80 ? 1 : c < 0x800 ? 2 : c < 0x10000 ? 3 : 4;
  }
  return n;
}

const bytes = (v: unknown): number => utf8Bytes(JSON.stringify(v));
const text = (n: number) => WIDEST_CHAR.repeat(n);
const pt = { x: WIDEST_UNIT, y: WIDEST_UNIT };

/** Each kind at its largest; a pen stroke without its points (they are counted document-wide). */
export function widestShapes(): Shape[] {
  const base = { id: text(MAX_ID_CHARS), colour: 'magenta', width: 'medium' } as const;
  return [
    { ...base, kind: 'ring', centre: pt, rx: WIDEST_UNIT, ry: WIDEST_UNIT },
    { ...base, kind: 'arrow', from: pt, to: pt },
    { ...base, kind: 'pen', points: [] },
    { ...base, kind: 'label', at: pt, text: text(MAX_LABEL_CHARS) },
    { ...base, kind: 'ruler', from: pt, to: pt, pitches: MAX_PITCHES },
    // Up to MAX_KNOWN_MM a number prints at most 17 significant digits, never wider than WIDEST_UNIT.
    { ...base, kind: 'scale', from: pt, to: pt, knownMm: WIDEST_UNIT },
    { ...base, kind: 'blur', topLeft: pt, bottomRight: pt },
  ];
}

/** Upper bound of a valid document's JSON size in bytes. */
export function maxDocumentBytes(): number {
  const empty = bytes({ schemaVersion: ANNOTATION_SCHEMA_VERSION, image: { width: MAX_IMAGE_SIDE, height: MAX_IMAGE_SIDE }, shapes: [] });
  const shape = Math.max(...widestShapes().map(bytes));
  // Each list item but the first adds a comma; counting one for every item keeps the bound simple.
  return empty + MAX_SHAPES * (shape + 1) + MAX_DOCUMENT_PEN_POINTS * (bytes(pt) + 1);
}
