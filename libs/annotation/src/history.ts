import type { Shape } from './document';

/**
 * Undo/redo over whole shape lists (small documents, so snapshots are simpler and safer
 * than diffs), with the saved point: `saved` is the list the last save sent, so undoing
 * back to it reads as saved again, and redoing away from it as unsaved.
 */
export interface History {
  past: Shape[][];
  present: Shape[];
  future: Shape[][];
  saved: Shape[];
}

const LIMIT = 200;

/** A history opened on a stored document: that document is the saved point. */
export const startHistory = (shapes: Shape[]): History => ({ past: [], present: shapes, future: [], saved: shapes });

export function commit(h: History, shapes: Shape[]): History {
  if (shapes === h.present) return h;
  return { ...h, past: [...h.past, h.present].slice(-LIMIT), present: shapes, future: [] };
}

export function undo(h: History): History {
  if (!h.past.length) return h;
  return { ...h, past: h.past.slice(0, -1), present: h.past[h.past.length - 1], future: [h.present, ...h.future] };
}

export function redo(h: History): History {
  if (!h.future.length) return h;
  return { ...h, past: [...h.past, h.present], present: h.future[0], future: h.future.slice(1) };
}

/** Records that `shapes` (a list this history held) is now what the server has. */
export const markSaved = (h: History, shapes: Shape[]): History => (h.saved === shapes ? h : { ...h, saved: shapes });

/** Whether what is on screen differs from the saved point. */
export const isDirty = (h: History): boolean => h.present !== h.saved;

/** Replaces one shape by id (or appends it when new). */
export function upsert(shapes: Shape[], shape: Shape): Shape[] {
  const i = shapes.findIndex((s) => s.id === shape.id);
  return i < 0 ? [...shapes, shape] : shapes.map((s, j) => (j === i ? shape : s));
}
