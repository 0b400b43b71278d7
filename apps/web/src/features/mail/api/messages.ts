import type { OutboxMessageDto } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const mailKeys = {
  messages: (jobId: number) => ['jobs', 'detail', jobId, 'messages'] as const,
};

const onTheWay = (list: OutboxMessageDto[] | undefined) => !!list?.some((m) => m.status === 'queued' || m.status === 'sending');

/** The job's e-mails; polled every few seconds while one is still on its way. */
export const messagesQuery = (jobId: number) =>
  queryOptions({
    queryKey: mailKeys.messages(jobId),
    queryFn: () => api<OutboxMessageDto[]>(`/jobs/${jobId}/messages`),
    refetchInterval: (q) => (onTheWay(q.state.data) ? 3000 : false),
  });

export const useMessages = (jobId: number) => useQuery(messagesQuery(jobId));

export function useResendMessage(jobId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (messageId: number) => api<OutboxMessageDto>(`/jobs/${jobId}/messages/${messageId}/resend`, { method: 'POST' }),
    onSettled: () => qc.invalidateQueries({ queryKey: mailKeys.messages(jobId) }),
  });
}

/** Queues "your bench report is ready" to the owner's e-mail on file. */
export function useSendReport(jobId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (reportId: number) => api<OutboxMessageDto>(`/jobs/${jobId}/reports/${reportId}/send`, { method: 'POST', body: {} }),
    onSettled: () => qc.invalidateQueries({ queryKey: mailKeys.messages(jobId) }),
  });
}
