import type { JobDto } from '@benchproof/contracts';

/** "Maker Model · colour" for lists and headers. */
export const jobBikeLabel = (job: Pick<JobDto, 'bike'>) => [`${job.bike.maker} ${job.bike.model}`, job.bike.colour].filter(Boolean).join(' · ');
