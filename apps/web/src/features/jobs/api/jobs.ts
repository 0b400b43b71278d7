import type {
  BookInRequest,
  FinalCheckDto,
  FinalCheckRequest,
  JobDetail,
  JobEvent,
  JobListQuery,
  JobPage,
  TransitionRequest,
  UpdateJobRequest,
} from '@benchproof/contracts';
import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type JobListParams = Partial<JobListQuery>;

export const jobKeys = {
  all: ['jobs'] as const,
  list: (params: JobListParams) => ['jobs', 'list', params] as const,
  detail: (id: number) => ['jobs', 'detail', id] as const,
  events: (id: number) => ['jobs', 'detail', id, 'events'] as const,
};

/** `quietAuth` for a warm-up before the session is known: a 401 then must not count as a lost session. */
export const jobsQuery = (params: JobListParams, { quietAuth = false } = {}) =>
  queryOptions({
    queryKey: jobKeys.list(params),
    queryFn: () => api<JobPage>('/jobs', { query: { ...params, status: params.status?.join(',') }, quietAuth }),
    placeholderData: keepPreviousData,
  });

export const jobQuery = (id: number) => queryOptions({ queryKey: jobKeys.detail(id), queryFn: () => api<JobDetail>(`/jobs/${id}`) });

export const jobEventsQuery = (id: number) => queryOptions({ queryKey: jobKeys.events(id), queryFn: () => api<JobEvent[]>(`/jobs/${id}/events`) });

export const useJobs = (params: JobListParams) => useQuery(jobsQuery(params));
export const useJob = (id: number) => useQuery(jobQuery(id));
export const useJobEvents = (id: number) => useQuery(jobEventsQuery(id));

export function useBookIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: BookInRequest) => api<JobDetail>('/jobs', { method: 'POST', body }),
    onSuccess: (job) => {
      qc.setQueryData(jobKeys.detail(job.id), job);
      void qc.invalidateQueries({ queryKey: jobKeys.all });
    },
  });
}

/** After any change to a job, refresh it (and the lists) from the server. */
function useJobMutation<B>(jobId: number, call: (body: B) => Promise<unknown>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: call,
    onSettled: () => qc.invalidateQueries({ queryKey: jobKeys.all }),
  });
}

export const useTransitionJob = (jobId: number) =>
  useJobMutation(jobId, (body: TransitionRequest) => api<JobDetail>(`/jobs/${jobId}/transitions`, { method: 'POST', body }));

export const useUpdateJob = (jobId: number) => useJobMutation(jobId, (body: UpdateJobRequest) => api<JobDetail>(`/jobs/${jobId}`, { method: 'PATCH', body }));

export const useFinalCheck = (jobId: number) =>
  useJobMutation(jobId, (body: FinalCheckRequest) => api<FinalCheckDto>(`/jobs/${jobId}/final-check`, { method: 'POST', body }));
