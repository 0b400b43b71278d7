import type { MediaListQuery } from '@benchproof/contracts';

/** Under the job's detail key, so refreshing a job refreshes its media too. */
export const mediaKeys = {
  ofJob: (jobId: number) => ['jobs', 'detail', jobId, 'media'] as const,
  list: (jobId: number, q: MediaListQuery) => ['jobs', 'detail', jobId, 'media', q] as const,
  finding: (jobId: number, findingId: number) => ['jobs', 'detail', jobId, 'findings', findingId, 'media'] as const,
  findings: (jobId: number) => ['jobs', 'detail', jobId, 'findings'] as const,
};
