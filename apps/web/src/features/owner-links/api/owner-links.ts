import type { AuditEvent, ConsentStatusDto, CreatedOwnerLinkDto, CreateOwnerLinkRequest, OwnerLinkDto, RecordConsentRequest } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const ownerKeys = {
  all: (jobId: number) => ['jobs', 'detail', jobId, 'owner'] as const,
  links: (jobId: number) => ['jobs', 'detail', jobId, 'owner', 'links'] as const,
  activity: (jobId: number) => ['jobs', 'detail', jobId, 'owner', 'activity'] as const,
  consent: (jobId: number) => ['jobs', 'detail', jobId, 'owner', 'consent'] as const,
};

export const ownerLinksQuery = (jobId: number) =>
  queryOptions({ queryKey: ownerKeys.links(jobId), queryFn: () => api<OwnerLinkDto[]>(`/jobs/${jobId}/owner-links`) });
export const ownerActivityQuery = (jobId: number) =>
  queryOptions({ queryKey: ownerKeys.activity(jobId), queryFn: () => api<AuditEvent[]>(`/jobs/${jobId}/owner-activity`) });
export const consentQuery = (jobId: number) =>
  queryOptions({ queryKey: ownerKeys.consent(jobId), queryFn: () => api<ConsentStatusDto>(`/jobs/${jobId}/consent`) });

export const useOwnerLinks = (jobId: number) => useQuery(ownerLinksQuery(jobId));
export const useOwnerActivity = (jobId: number) => useQuery(ownerActivityQuery(jobId));
export const useConsentStatus = (jobId: number) => useQuery(consentQuery(jobId));

function useOwnerMutation<B, R>(jobId: number, call: (body: B) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: call, onSettled: () => qc.invalidateQueries({ queryKey: ownerKeys.all(jobId) }) });
}

export const useCreateOwnerLink = (jobId: number) =>
  useOwnerMutation(jobId, (body: CreateOwnerLinkRequest) => api<CreatedOwnerLinkDto>(`/jobs/${jobId}/owner-links`, { method: 'POST', body }));

export const useRevokeOwnerLink = (jobId: number) =>
  useOwnerMutation(jobId, (linkId: number) => api<OwnerLinkDto>(`/jobs/${jobId}/owner-links/${linkId}/revoke`, { method: 'POST' }));

export const useRecordConsent = (jobId: number) =>
  useOwnerMutation(jobId, (body: RecordConsentRequest) => api<ConsentStatusDto>(`/jobs/${jobId}/consent`, { method: 'POST', body }));
