import type { ReportDto, VerifyResult } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const reportsQuery = (jobId: number) =>
  queryOptions({ queryKey: ['jobs', jobId, 'reports'], queryFn: () => api<ReportDto[]>(`/jobs/${jobId}/reports`) });

/** Polls once a second while anything renders, so progress moves without a reload. */
export const useReports = (jobId: number) =>
  useQuery({ ...reportsQuery(jobId), refetchInterval: (q) => (q.state.data?.some((r) => r.state === 'rendering') ? 1000 : false) });

export function useCreateDraft(jobId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<ReportDto>(`/jobs/${jobId}/reports/drafts`, { method: 'POST' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: reportsQuery(jobId).queryKey }),
  });
}

export function useIssueReport(jobId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (draftId: number) => api<ReportDto>(`/jobs/${jobId}/reports/issue`, { method: 'POST', body: { draftId } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: reportsQuery(jobId).queryKey }),
  });
}

/** Public: no session needed. */
export const verifyReport = (hash: string) => api<VerifyResult>(`/verify/${encodeURIComponent(hash)}`, { quietAuth: true });
