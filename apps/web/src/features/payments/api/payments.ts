import type { CheckoutStart, JobPayments, OwnerPayment, RecordPaymentRequest, RefundRequest } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const paymentKeys = {
  job: (jobId: number) => ['jobs', 'detail', jobId, 'payments'] as const,
  owner: (token: string) => ['owner-page', token, 'payment'] as const,
};

export const jobPaymentsQuery = (jobId: number) =>
  queryOptions({ queryKey: paymentKeys.job(jobId), queryFn: () => api<JobPayments>(`/jobs/${jobId}/payments`) });

export const useJobPayments = (jobId: number) => useQuery(jobPaymentsQuery(jobId));

export function useRecordPayment(jobId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: RecordPaymentRequest) => api<JobPayments>(`/jobs/${jobId}/payments`, { method: 'POST', body }),
    onSuccess: (data) => qc.setQueryData(paymentKeys.job(jobId), data),
    onSettled: () => qc.invalidateQueries({ queryKey: ['jobs'] }),
  });
}

export function useRefund(jobId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ paymentId, body }: { paymentId: number; body: RefundRequest }) =>
      api<JobPayments>(`/jobs/${jobId}/payments/${paymentId}/refunds`, { method: 'POST', body }),
    onSuccess: (data) => qc.setQueryData(paymentKeys.job(jobId), data),
    onSettled: () => qc.invalidateQueries({ queryKey: ['jobs'] }),
  });
}

const owner = (token: string) => `/owner/${encodeURIComponent(token)}/payment`;

/** The owner's balance; polled for a while after coming back from the checkout, until the provider's notice has arrived. */
export const useOwnerPayment = (token: string, waiting: boolean) =>
  useQuery({
    queryKey: paymentKeys.owner(token),
    queryFn: () => api<OwnerPayment>(owner(token), { quietAuth: true }),
    refetchInterval: (q) => (waiting && q.state.data?.balance.state !== 'paid' ? 2000 : false),
  });

/** Opens the hosted checkout and sends the browser there. */
export function useStartCheckout(token: string) {
  return useMutation({
    mutationFn: () => api<CheckoutStart>(`${owner(token)}/checkout`, { method: 'POST', quietAuth: true }),
    onSuccess: ({ url }) => window.location.assign(url),
  });
}
