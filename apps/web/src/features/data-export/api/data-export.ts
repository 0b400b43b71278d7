import type { EraseCustomerResult } from '@benchproof/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** Plain links: the browser downloads the zip with the session cookie, at its own pace. */
export const shopExportUrl = '/api/shop/export';
export const customerExportUrl = (customerId: number) => `/api/customers/${customerId}/export`;

/** Erases a customer's personal data; the request repeats the customer's number as confirmation. */
export function useEraseCustomer(customerId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<EraseCustomerResult>(`/customers/${customerId}/erase`, { method: 'POST', body: { confirmCustomerId: customerId } }),
    // The customer's name, bikes and jobs now read "[erased]" wherever they are cached.
    onSuccess: () => qc.invalidateQueries(),
  });
}
