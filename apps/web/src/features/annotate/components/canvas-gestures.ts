import type { Point, Shape } from '@benchproof/annotation';
import { translateShape } from '@benchproof/annotation';
import { dragHandle, draftShape, type Style, type Tool } from '../model/edit';

/** Finger-sized: a 22 px radius is a 44 px target on screen whatever the zoom. */
export const TARGET_PX = 22;

export type Gesture =
  | { kind: 'draw'; start: Point; pen: Point[] }
  | { kind: 'move'; start: Point; original: Shape }
  | { kind: 'handle'; index: number; original: Shape }
  | { kind: 'pan'; last: { x: number; y: number } };

/** The document's shapes with the live draft in place of (or after) the shape it edits. */
export function withDraft(shapes: Shape[], draft: Shape | null): Shape[] {
  const out = shapes.map((s) => (draft && s.id === draft.id ? draft : s));
  if (draft && !shapes.some((s) => s.id === draft.id)) out.push(draft);
  return out;
}

/**
 * The draft after the pointer moved to `p` during a draw, move or handle gesture;
 * null when the gesture does not change the draft. A pen stroke records the point.
 */
export function draftAfterMove(g: Exclude<Gesture, { kind: 'pan' }>, p: Point, draft: Shape | null, tool: Tool, style: Style, aspect: number): Shape | null {
  if (g.kind === 'draw') {
    if (!draft || tool === 'select') return null;
    if (tool === 'pen') g.pen.push(p);
    return draftShape(tool, draft.id, g.start, p, style, aspect, tool === 'pen' ? g.pen.slice(0, -1) : []);
  }
  if (g.kind === 'move') return translateShape(g.original, p.x - g.start.x, p.y - g.start.y);
  return dragHandle(g.original, g.index, p);
}

/** Pans the zoomed photo by the finger's travel since the last move. */
export function panStep(g: Extract<Gesture, { kind: 'pan' }>, evt: { clientX: number; clientY: number }, panBy: (dx: number, dy: number) => void): void {
  panBy(evt.clientX - g.last.x, evt.clientY - g.last.y);
  g.last = { x: evt.clientX, y: evt.clientY };
}
