/**
 * How the jobs list may be sorted (JobListQuerySchema's `sort`). Kept free of zod so the
 * web's jobs table can read it without loading the schema library on its first screen.
 */
export const JOB_SORT_FIELDS = ['promisedOn', 'createdAt', 'number', 'status'] as const;
