import type { ConsentDto, OwnerConsentRequest, OwnerDecisionsRequest, OwnerPageDto } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, type ApiError } from '../../../lib/api-client';

/** Owner-side calls: the token in the path is the only credential (no session, no CSRF). */
const base = (token: string) => `/owner/${encodeURIComponent(token)}`;

export const ownerPageKey = (token: string) => ['owner-page', token] as const;

export const ownerPageQuery = (token: string) =>
  queryOptions({
    queryKey: ownerPageKey(token),
    queryFn: () => api<OwnerPageDto>(base(token), { quietAuth: true }),
    // A dead link stays dead; retrying only delays the page that says so.
    retry: (count, err) => count < 2 && ![404, 410, 429].includes((err as ApiError).status),
    staleTime: 60_000,
  });

export const useOwnerPage = (token: string) => useQuery(ownerPageQuery(token));

export function useOwnerDecisions(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: OwnerDecisionsRequest) => api<OwnerPageDto>(`${base(token)}/decisions`, { method: 'POST', body, quietAuth: true }),
    onSuccess: (page) => qc.setQueryData(ownerPageKey(token), page),
  });
}

export function useOwnerConsent(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: OwnerConsentRequest) => api<ConsentDto>(`${base(token)}/consent`, { method: 'POST', body, quietAuth: true }),
    onSuccess: (consent) => qc.setQueryData<OwnerPageDto>(ownerPageKey(token), (p) => (p ? { ...p, consent } : p)),
  });
}
