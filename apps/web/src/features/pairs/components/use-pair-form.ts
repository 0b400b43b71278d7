import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useCreatePair } from '../api/pairs';

/** The hand-built pair's chosen shots and caption, with errors placed under the field they concern. */
export function usePairForm(jobId: number, onDone: () => void) {
  const [beforeId, setBefore] = useState<number | null>(null);
  const [afterId, setAfter] = useState<number | null>(null);
  const [caption, setCaption] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useCreatePair(jobId);

  const submit = () => {
    const missing: Record<string, string> = {};
    if (!beforeId) missing.beforeAssetId = 'Tap a before shot.';
    if (!afterId) missing.afterAssetId = 'Tap an after shot.';
    setErrors(missing);
    if (!beforeId || !afterId) return;
    create.mutate(
      { beforeAssetId: beforeId, afterAssetId: afterId, caption },
      {
        onSuccess: () => {
          setBefore(null);
          setAfter(null);
          setCaption('');
          onDone();
        },
        // Server refusals (wrong phase, other job, already a pair) go under the field they concern.
        onError: (e) => setErrors(e instanceof ApiError ? { afterAssetId: e.message, ...e.fieldErrors() } : { afterAssetId: 'Could not save the pair.' }),
      },
    );
  };

  return { beforeId, setBefore, afterId, setAfter, caption, setCaption, errors, submit, pending: create.isPending };
}
