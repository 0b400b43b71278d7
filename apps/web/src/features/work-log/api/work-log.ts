import type { TorqueEntryDto, TorqueEntryRequest, WorkEntryDto, WorkEntryRequest } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const workLogKeys = {
  work: (jobId: number) => ['jobs', 'detail', jobId, 'work-entries'] as const,
  torque: (jobId: number) => ['jobs', 'detail', jobId, 'torque-entries'] as const,
};

export const workEntriesQuery = (jobId: number) =>
  queryOptions({ queryKey: workLogKeys.work(jobId), queryFn: () => api<WorkEntryDto[]>(`/jobs/${jobId}/work-entries`) });
export const torqueEntriesQuery = (jobId: number) =>
  queryOptions({ queryKey: workLogKeys.torque(jobId), queryFn: () => api<TorqueEntryDto[]>(`/jobs/${jobId}/torque-entries`) });

export const useWorkEntries = (jobId: number) => useQuery(workEntriesQuery(jobId));
export const useTorqueEntries = (jobId: number) => useQuery(torqueEntriesQuery(jobId));

export function useAddWorkEntry(jobId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: WorkEntryRequest) => api<WorkEntryDto>(`/jobs/${jobId}/work-entries`, { method: 'POST', body }),
    onSettled: () => qc.invalidateQueries({ queryKey: workLogKeys.work(jobId) }),
  });
}

/** The server recomputes the verdict; the form's is the live preview. */
export function useAddTorqueEntry(jobId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: TorqueEntryRequest) => api<TorqueEntryDto>(`/jobs/${jobId}/torque-entries`, { method: 'POST', body }),
    onSettled: () => qc.invalidateQueries({ queryKey: workLogKeys.torque(jobId) }),
  });
}
