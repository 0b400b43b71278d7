import type { BikeDto, BikeHistory, BikeInput, BikeListItem } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const bikeKeys = {
  all: ['bikes'] as const,
  ofCustomer: (customerId: number) => ['bikes', 'customer', customerId] as const,
  detail: (id: number) => ['bikes', 'detail', id] as const,
  history: (id: number) => ['bikes', 'detail', id, 'history'] as const,
};

export const customerBikesQuery = (customerId: number) =>
  queryOptions({ queryKey: bikeKeys.ofCustomer(customerId), queryFn: () => api<BikeListItem[]>(`/customers/${customerId}/bikes`) });

export const bikeQuery = (id: number) => queryOptions({ queryKey: bikeKeys.detail(id), queryFn: () => api<BikeListItem>(`/bikes/${id}`) });

export const bikeHistoryQuery = (id: number) => queryOptions({ queryKey: bikeKeys.history(id), queryFn: () => api<BikeHistory>(`/bikes/${id}/history`) });

export const useCustomerBikes = (customerId: number) => useQuery(customerBikesQuery(customerId));
export const useBike = (id: number) => useQuery(bikeQuery(id));
export const useBikeHistory = (id: number) => useQuery(bikeHistoryQuery(id));

export function useSaveBike(id?: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: BikeInput) => (id ? api<BikeDto>(`/bikes/${id}`, { method: 'PATCH', body }) : api<BikeDto>('/bikes', { method: 'POST', body })),
    onSuccess: (b) => {
      qc.setQueryData(bikeKeys.detail(b.id), b);
      void qc.invalidateQueries({ queryKey: bikeKeys.all });
      void qc.invalidateQueries({ queryKey: ['customers'] });
    },
  });
}
