import type { AnnotationDocument, Shape } from '@benchproof/annotation';
import { useEffect, useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useSaveAnnotation } from '../api/annotation';

export type SaveState = 'saved' | 'dirty' | 'saving' | 'conflict' | 'error';

/** The history's saved point, which the autosave reads and moves. */
export interface SavedPoint {
  dirty: boolean;
  markSaved: (shapes: Shape[]) => void;
}

/**
 * Saves 1.2 s after the last change, each save a new version built on the last one
 * this editor saw; a CONFLICT stops autosave so nobody's work is overwritten. Whether
 * there is anything to save is the undo history's saved point, so undoing back to
 * the saved shapes reads "Saved" again.
 */
export function useAutosave(mediaId: number, doc: AnnotationDocument, initialVersion: number, point: SavedPoint) {
  const save = useSaveAnnotation(mediaId);
  const [version, setVersion] = useState(initialVersion);
  const [state, setState] = useState<SaveState>('saved');

  const flush = async (): Promise<void> => {
    const sent = doc;
    if (!point.dirty || state === 'conflict' || state === 'saving') return;
    setState('saving');
    try {
      const dto = await save.mutateAsync({ baseVersion: version, document: sent });
      setVersion(dto.version);
      point.markSaved(sent.shapes);
      setState('saved');
    } catch (err) {
      setState(err instanceof ApiError && err.code === 'CONFLICT' ? 'conflict' : 'error');
    }
  };

  useEffect(() => {
    if (!point.dirty || state === 'conflict' || state === 'saving') return;
    const t = setTimeout(() => void flush(), 1200);
    return () => clearTimeout(t);
    // flush is this render's, with this render's doc; re-arm on every change of the shapes.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [doc.shapes, point.dirty, state]);

  const shown: SaveState = state === 'saved' || state === 'error' ? (point.dirty ? (state === 'error' ? 'error' : 'dirty') : 'saved') : state;
  return { state: shown, version: point.dirty ? null : version, flush } as const;
}
