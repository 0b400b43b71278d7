import type { InvitationDto, InviteRequest, UpdateUserRequest, UserDto } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const usersQuery = queryOptions({ queryKey: ['users'], queryFn: () => api<UserDto[]>('/users') });

export const useUsers = () => useQuery(usersQuery);

export const invitationsQuery = queryOptions({ queryKey: ['invitations'], queryFn: () => api<InvitationDto[]>('/invitations') });

export const useInvitations = () => useQuery(invitationsQuery);

function useInvitationChange<V>(call: (v: V) => Promise<unknown>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: call, onSuccess: () => qc.invalidateQueries({ queryKey: invitationsQuery.queryKey }) });
}

export const useInvite = () => useInvitationChange((body: InviteRequest) => api<InvitationDto>('/invitations', { method: 'POST', body }));
export const useResendInvitation = () => useInvitationChange((id: number) => api<InvitationDto>(`/invitations/${id}/resend`, { method: 'POST' }));
export const useWithdrawInvitation = () => useInvitationChange((id: number) => api<void>(`/invitations/${id}`, { method: 'DELETE' }));

export const useSendResetLink = () => useMutation({ mutationFn: (id: number) => api<{ message: string }>(`/users/${id}/password-link`, { method: 'POST' }) });

export function useUpdateUser() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: UpdateUserRequest & { id: number }) => api<UserDto>(`/users/${id}`, { method: 'PATCH', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: usersQuery.queryKey }),
  });
}
