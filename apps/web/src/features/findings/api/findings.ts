import type {
  CreateFindingRequest,
  DecisionDto,
  EstimateDto,
  FindingDto,
  RecommendationDto,
  RecommendationRequest,
  RecordDecisionRequest,
  UpdateFindingRequest,
} from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const findingKeys = {
  ofJob: (jobId: number) => ['jobs', 'detail', jobId, 'findings'] as const,
  estimate: (jobId: number) => ['jobs', 'detail', jobId, 'estimate'] as const,
};

export const findingsQuery = (jobId: number) =>
  queryOptions({ queryKey: findingKeys.ofJob(jobId), queryFn: () => api<FindingDto[]>(`/jobs/${jobId}/findings`) });
export const estimateQuery = (jobId: number) =>
  queryOptions({ queryKey: findingKeys.estimate(jobId), queryFn: () => api<EstimateDto>(`/jobs/${jobId}/estimate`) });

export const useFindings = (jobId: number) => useQuery(findingsQuery(jobId));
export const useEstimate = (jobId: number) => useQuery(estimateQuery(jobId));

/** Every change to findings refreshes the list and the estimate totals. */
function useFindingMutation<B, R>(jobId: number, call: (body: B) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: call,
    onSettled: () =>
      Promise.all([qc.invalidateQueries({ queryKey: findingKeys.ofJob(jobId) }), qc.invalidateQueries({ queryKey: findingKeys.estimate(jobId) })]),
  });
}

export const useSaveFinding = (jobId: number, findingId?: number) =>
  useFindingMutation(jobId, (body: CreateFindingRequest | UpdateFindingRequest) =>
    findingId
      ? api<FindingDto>(`/jobs/${jobId}/findings/${findingId}`, { method: 'PATCH', body })
      : api<FindingDto>(`/jobs/${jobId}/findings`, { method: 'POST', body }),
  );

export const useSaveRecommendation = (jobId: number, findingId: number) =>
  useFindingMutation(jobId, (body: RecommendationRequest) =>
    api<RecommendationDto>(`/jobs/${jobId}/findings/${findingId}/recommendation`, { method: 'POST', body }),
  );

export const useRecordDecision = (jobId: number, recommendationId: number) =>
  useFindingMutation(jobId, (body: RecordDecisionRequest) =>
    api<DecisionDto>(`/jobs/${jobId}/recommendations/${recommendationId}/decision`, { method: 'POST', body }),
  );
