import type { ImportMapping, ImportPreview, ImportSummary } from '@benchproof/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const usePreviewImport = () =>
  useMutation({ mutationFn: (body: { csv: string; mapping?: ImportMapping }) => api<ImportPreview>('/imports/customers/preview', { method: 'POST', body }) });

export function useRunImport() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: { csv: string; mapping: ImportMapping }) => api<ImportSummary>('/imports/customers', { method: 'POST', body }),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: ['customers'] }), qc.invalidateQueries({ queryKey: ['bikes'] })]),
  });
}
