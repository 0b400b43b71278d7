import type { Shape } from '@benchproof/annotation';

/** Undo/redo over whole shape lists: small documents, so snapshots are simpler and safer than diffs. */
export interface History {
  past: Shape[][];
  present: Shape[];
  future: Shape[][];
}

const LIMIT = 200;

export const startHistory = (shapes: Shape[]): History => ({ past: [], present: shapes, future: [] });

export function commit(h: History, shapes: Shape[]): History {
  if (shapes === h.present) return h;
  return { past: [...h.past, h.present].slice(-LIMIT), present: shapes, future: [] };
}

export function undo(h: History): History {
  if (!h.past.length) return h;
  return { past: h.past.slice(0, -1), present: h.past[h.past.length - 1], future: [h.present, ...h.future] };
}

export function redo(h: History): History {
  if (!h.future.length) return h;
  return { past: [...h.past, h.present], present: h.future[0], future: h.future.slice(1) };
}

/** Replaces one shape by id (or appends it when new). */
export function upsert(shapes: Shape[], shape: Shape): Shape[] {
  const i = shapes.findIndex((s) => s.id === shape.id);
  return i < 0 ? [...shapes, shape] : shapes.map((s, j) => (j === i ? shape : s));
}

export const newId = (): string => Math.random().toString(36).slice(2, 10);
