import type { FailedWork } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

const failedWorkKey = ['background-work', 'failed'] as const;

/** Failed background work of the shop (manager); asked again every half minute while the screen is open. */
export const failedWorkQuery = queryOptions({
  queryKey: failedWorkKey,
  queryFn: () => api<FailedWork[]>('/background-work/failed'),
  refetchInterval: 30_000,
});

export const useFailedWork = () => useQuery(failedWorkQuery);

/** Runs one failed piece of work again at once, with fresh attempts. */
export function useRetryWork() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<{ queued: true }>(`/background-work/failed/${id}/retry`, { method: 'POST' }),
    onSettled: () => qc.invalidateQueries({ queryKey: failedWorkKey }),
  });
}
