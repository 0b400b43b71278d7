import type { PairSuggestionDto } from '@benchproof/contracts';
import { useState } from 'react';
import { useCreatePair, usePairableShots, usePairSuggestions } from '../api/pairs';

/**
 * Suggestions and the shots a pair can be built from, fetched alongside the pairs themselves,
 * and the one-tap pairing of a suggestion (its card shows busy until the request settles).
 */
export function useSuggestedPairs(jobId: number) {
  const suggestions = usePairSuggestions(jobId);
  const shots = usePairableShots(jobId);
  const create = useCreatePair(jobId);
  const [busyKey, setBusyKey] = useState<string | null>(null);
  const pick = (s: PairSuggestionDto) => {
    setBusyKey(`${s.before.id}-${s.after.id}`);
    create.mutate({ beforeAssetId: s.before.id, afterAssetId: s.after.id, caption: s.after.caption }, { onSettled: () => setBusyKey(null) });
  };
  return { suggestions: suggestions.data, shots: shots.data, pickError: create.error, busyKey, pick };
}

export type SuggestedPairsState = ReturnType<typeof useSuggestedPairs>;
