import type { TextMessageDto } from '@benchproof/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const textKeys = {
  texts: (jobId: number) => ['jobs', 'detail', jobId, 'texts'] as const,
};

/** Still moving: waiting, sending, or handed over without a delivery report yet. */
const onTheWay = (list: TextMessageDto[] | undefined) => !!list?.some((m) => m.status === 'queued' || m.status === 'sending' || m.status === 'sent');

/** The job's texts; polled every few seconds while one has not reached the owner's phone. */
export const textsQuery = (jobId: number) =>
  queryOptions({
    queryKey: textKeys.texts(jobId),
    queryFn: () => api<TextMessageDto[]>(`/jobs/${jobId}/texts`),
    refetchInterval: (q) => (onTheWay(q.state.data) ? 3000 : false),
  });

export const useTexts = (jobId: number) => useQuery(textsQuery(jobId));
