import type { DiskSpaceDto } from '@benchproof/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** Free space on the server's disks; asked again every five minutes while a manager has the app open. */
export const diskSpaceQuery = queryOptions({
  queryKey: ['health', 'disk'] as const,
  queryFn: () => api<DiskSpaceDto>('/api/health/disk'),
  refetchInterval: 5 * 60_000,
  staleTime: 60_000,
});

export const useDiskSpace = () => useQuery(diskSpaceQuery);
