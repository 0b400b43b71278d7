import { commit, isDirty, markSaved, redo, startHistory, undo, upsert, type Shape } from '@benchproof/annotation';
import { useState } from 'react';

/** The document's shapes with undo and redo (every put or remove is one step back) and the saved point. */
export function useShapeHistory(initial: Shape[]) {
  const [history, setHistory] = useState(() => startHistory(initial));
  return {
    shapes: history.present,
    canUndo: history.past.length > 0,
    canRedo: history.future.length > 0,
    /** Whether the shapes on screen differ from the last saved ones (undoing back to them clears it). */
    dirty: isDirty(history),
    markSaved: (shapes: Shape[]) => setHistory((h) => markSaved(h, shapes)),
    undo: () => setHistory(undo),
    redo: () => setHistory(redo),
    /** Adds a new shape, or replaces the one with the same id. */
    put: (shape: Shape) => setHistory((h) => commit(h, upsert(h.present, shape))),
    remove: (id: string) =>
      setHistory((h) =>
        commit(
          h,
          h.present.filter((s) => s.id !== id),
        ),
      ),
  };
}
