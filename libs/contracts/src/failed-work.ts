import { z } from 'zod';

/** A piece of background work that failed (a thumbnail, a render, an e-mail), for the manager's retry list. */
export const FailedWorkSchema = z.object({
  id: z.number().int(),
  /** The task kind, e.g. 'media.derivatives', 'report.render', 'mail.send'. */
  kind: z.string(),
  key: z.string(),
  /** The job the work belongs to (a photo's, a report's, an e-mail's job), when it belongs to one. */
  jobId: z.number().int().nullable(),
  jobNumber: z.string().nullable(),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  /** When it is tried again by itself (a transient failure: full disk, lost connection), or null. */
  nextTryAt: z.string().nullable(),
  failedAt: z.string(),
});
export type FailedWork = z.infer<typeof FailedWorkSchema>;
