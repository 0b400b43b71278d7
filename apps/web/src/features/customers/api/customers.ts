import type { CustomerDto, CustomerInput, CustomerListQuery, CustomerPage } from '@benchproof/contracts';
import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const customerKeys = {
  all: ['customers'] as const,
  list: (q: Partial<CustomerListQuery>) => ['customers', 'list', q] as const,
  detail: (id: number) => ['customers', 'detail', id] as const,
};

export const customersQuery = (q: Partial<CustomerListQuery>) =>
  queryOptions({ queryKey: customerKeys.list(q), queryFn: () => api<CustomerPage>('/customers', { query: q }), placeholderData: keepPreviousData });

export const customerQuery = (id: number) => queryOptions({ queryKey: customerKeys.detail(id), queryFn: () => api<CustomerDto>(`/customers/${id}`) });

export const useCustomers = (q: Partial<CustomerListQuery>, enabled = true) => useQuery({ ...customersQuery(q), enabled });
export const useCustomer = (id: number) => useQuery(customerQuery(id));

export function useSaveCustomer(id?: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CustomerInput) =>
      id ? api<CustomerDto>(`/customers/${id}`, { method: 'PATCH', body }) : api<CustomerDto>('/customers', { method: 'POST', body }),
    onSuccess: (c) => {
      qc.setQueryData(customerKeys.detail(c.id), c);
      void qc.invalidateQueries({ queryKey: customerKeys.all });
    },
  });
}
