import type { BackupList, BackupSummary } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

const backupsKey = ['backups'] as const;

export const backupsQuery = queryOptions({ queryKey: backupsKey, queryFn: () => api<BackupList>('/backups') });

export const useBackups = () => useQuery(backupsQuery);

/** A backup now (a second tap while one runs waits for that one on the server). */
export function useBackUpNow() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<BackupSummary>('/backups', { method: 'POST' }),
    onSettled: () => qc.invalidateQueries({ queryKey: backupsKey }),
  });
}
