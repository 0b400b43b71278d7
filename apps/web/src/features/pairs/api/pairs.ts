import type { CreatePairRequest, MediaAssetDto, PairSuggestionsDto, ReorderPairsRequest, ShotPairDto, UpdatePairRequest } from '@benchproof/contracts';
import { PAIRABLE_KINDS } from '@benchproof/domain';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** Under the job's detail key, so refreshing a job refreshes its pairs too. */
export const pairKeys = {
  ofJob: (jobId: number) => ['jobs', 'detail', jobId, 'pairs'] as const,
  suggestions: (jobId: number) => ['jobs', 'detail', jobId, 'pair-suggestions'] as const,
};

export const pairsQuery = (jobId: number) => queryOptions({ queryKey: pairKeys.ofJob(jobId), queryFn: () => api<ShotPairDto[]>(`/jobs/${jobId}/pairs`) });

export const pairSuggestionsQuery = (jobId: number) =>
  queryOptions({
    queryKey: pairKeys.suggestions(jobId),
    queryFn: () => api<PairSuggestionsDto>(`/jobs/${jobId}/pair-suggestions`),
    // Hashes are computed in the background after upload: look again until none is missing.
    refetchInterval: (q) => ((q.state.data?.pendingHashes ?? 0) > 0 ? 3000 : false),
  });

export const usePairs = (jobId: number) => useQuery(pairsQuery(jobId));
export const usePairSuggestions = (jobId: number) => useQuery(pairSuggestionsQuery(jobId));

/** Any change to pairs refreshes the list and the suggestions (paired shots leave them). */
function usePairMutation<B, R>(jobId: number, call: (body: B) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: call,
    onSettled: () => Promise.all([qc.invalidateQueries({ queryKey: pairKeys.ofJob(jobId) }), qc.invalidateQueries({ queryKey: pairKeys.suggestions(jobId) })]),
  });
}

export const useCreatePair = (jobId: number) =>
  usePairMutation(jobId, (body: CreatePairRequest) => api<ShotPairDto>(`/jobs/${jobId}/pairs`, { method: 'POST', body }));

export const useUpdatePair = (jobId: number, pairId: number) =>
  usePairMutation(jobId, (body: UpdatePairRequest) => api<ShotPairDto>(`/jobs/${jobId}/pairs/${pairId}`, { method: 'PATCH', body }));

export const useDeletePair = (jobId: number, pairId: number) => usePairMutation(jobId, () => api<void>(`/jobs/${jobId}/pairs/${pairId}`, { method: 'DELETE' }));

export const useReorderPairs = (jobId: number) =>
  usePairMutation(jobId, (body: ReorderPairsRequest) => api<ShotPairDto[]>(`/jobs/${jobId}/pairs/order`, { method: 'PUT', body }));

/** The job's stills that can stand in a pair (under the media key, so uploads refresh it). */
export const usePairableShots = (jobId: number) =>
  useQuery({
    queryKey: ['jobs', 'detail', jobId, 'media', 'pairable'] as const,
    queryFn: () => api<MediaAssetDto[]>(`/jobs/${jobId}/media`),
    select: (all) => all.filter((a) => PAIRABLE_KINDS.includes(a.kind) && a.status === 'ready'),
  });
