import type { AnnotationDocument } from '@benchproof/annotation';
import { useEffect, useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useSaveAnnotation } from '../api/annotation';

export type SaveState = 'saved' | 'dirty' | 'saving' | 'conflict' | 'error';

/**
 * Saves 1.2 s after the last change, each save a new version built on the last one
 * this editor saw; a CONFLICT stops autosave so nobody's work is overwritten.
 */
export function useAutosave(mediaId: number, doc: AnnotationDocument, initialVersion: number) {
  const save = useSaveAnnotation(mediaId);
  const [version, setVersion] = useState(initialVersion);
  const [state, setState] = useState<SaveState>('saved');
  const [savedJson, setSavedJson] = useState(() => JSON.stringify(doc));
  const json = JSON.stringify(doc);
  const dirty = json !== savedJson;

  const flush = async (): Promise<void> => {
    if (json === savedJson || state === 'conflict') return;
    setState('saving');
    try {
      const dto = await save.mutateAsync({ baseVersion: version, document: doc });
      setVersion(dto.version);
      setSavedJson(json);
      setState('saved');
    } catch (err) {
      setState(err instanceof ApiError && err.code === 'CONFLICT' ? 'conflict' : 'error');
    }
  };

  useEffect(() => {
    if (!dirty || state === 'conflict' || state === 'saving') return;
    const t = setTimeout(() => void flush(), 1200);
    return () => clearTimeout(t);
    // flush reads the latest doc through json; re-arm on every change.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [json, state]);

  return { state: dirty && state === 'saved' ? 'dirty' : state, version: dirty ? null : version, flush } as const;
}
