import type { FindingDto, FindingMediaDto, MediaAssetDto, MediaListQuery, RetagRequest } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { mediaKeys } from './media-keys';

/** While any asset still waits for its derivatives, poll so the spinner turns into a thumbnail. */
const pollWhilePending = (data: MediaAssetDto[] | undefined) => (data?.some((a) => a.status === 'pending') ? 1500 : false);

export const mediaQuery = (jobId: number, q: MediaListQuery = {}) =>
  queryOptions({
    queryKey: mediaKeys.list(jobId, q),
    queryFn: () => api<MediaAssetDto[]>(`/jobs/${jobId}/media`, { query: q }),
    refetchInterval: (query) => pollWhilePending(query.state.data),
  });

export const useMedia = (jobId: number, q: MediaListQuery = {}) => useQuery(mediaQuery(jobId, q));

function useMediaMutation<B, R>(jobId: number, call: (body: B) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: call, onSettled: () => qc.invalidateQueries({ queryKey: mediaKeys.ofJob(jobId) }) });
}

export const useRetagMedia = (jobId: number) =>
  useMediaMutation(jobId, (body: RetagRequest) => api<MediaAssetDto[]>(`/jobs/${jobId}/media`, { method: 'PATCH', body }));

export const useDeleteMedia = (jobId: number) =>
  useMediaMutation(jobId, async (ids: number[]) => {
    for (const id of ids) await api<void>(`/jobs/${jobId}/media/${id}`, { method: 'DELETE' });
  });

/** The job's findings, for the "Link to finding" picker (read straight from the API; features stay apart). */
export const useJobFindings = (jobId: number, enabled: boolean) =>
  useQuery({ queryKey: mediaKeys.findings(jobId), queryFn: () => api<FindingDto[]>(`/jobs/${jobId}/findings`), enabled });

export const findingMediaQuery = (jobId: number, findingId: number) =>
  queryOptions({ queryKey: mediaKeys.finding(jobId, findingId), queryFn: () => api<FindingMediaDto>(`/jobs/${jobId}/findings/${findingId}/media`) });

export const useFindingMedia = (jobId: number, findingId: number) => useQuery(findingMediaQuery(jobId, findingId));

/** Replaces the shots of a finding with `assetIds` (the API keeps their order). */
export function useLinkFindingMedia(jobId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ findingId, assetIds }: { findingId: number; assetIds: number[] }) =>
      api<FindingMediaDto>(`/jobs/${jobId}/findings/${findingId}/media`, { method: 'PUT', body: { assetIds } }),
    onSuccess: (res) => qc.setQueryData(mediaKeys.finding(jobId, res.findingId), res),
  });
}
