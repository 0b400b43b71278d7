import type { TextMessageDto } from '@benchproof/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const textKeys = {
  texts: (jobId: number) => ['jobs', 'detail', jobId, 'texts'] as const,
  /** Under the customer's key, so what refreshes the customer refreshes these too. */
  customer: (customerId: number) => ['customers', 'detail', customerId, 'texts'] as const,
};

/** Still moving: waiting, sending, or handed over without a delivery report yet. */
const onTheWay = (list: TextMessageDto[] | undefined) => !!list?.some((m) => m.status === 'queued' || m.status === 'sending' || m.status === 'sent');

/** A list of texts from `path`; polled every few seconds while one has not reached the owner's phone. */
const textList = (queryKey: readonly unknown[], path: string) =>
  queryOptions({ queryKey, queryFn: () => api<TextMessageDto[]>(path), refetchInterval: (q) => (onTheWay(q.state.data) ? 3000 : false) });

/** The job's texts. */
export const textsQuery = (jobId: number) => textList(textKeys.texts(jobId), `/jobs/${jobId}/texts`);

export const useTexts = (jobId: number) => useQuery(textsQuery(jobId));

/** Every text to one customer, newest first, across their jobs. */
export const customerTextsQuery = (customerId: number) => textList(textKeys.customer(customerId), `/customers/${customerId}/texts`);

export const useCustomerTexts = (customerId: number) => useQuery(customerTextsQuery(customerId));
