import type { CreateUserRequest, UpdateUserRequest, UserDto } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const usersQuery = queryOptions({ queryKey: ['users'], queryFn: () => api<UserDto[]>('/users') });

export const useUsers = () => useQuery(usersQuery);

export function useCreateUser() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateUserRequest) => api<UserDto>('/users', { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: usersQuery.queryKey }),
  });
}

export function useUpdateUser() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: UpdateUserRequest & { id: number }) => api<UserDto>(`/users/${id}`, { method: 'PATCH', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: usersQuery.queryKey }),
  });
}
