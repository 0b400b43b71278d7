import type { LoaderFunctionArgs } from 'react-router';
import { jobListParams, jobsQuery } from '../../../features/jobs';
import { queryClient } from '../../../lib/query-client';

/**
 * Starts the jobs list request beside the session check and the page's code instead of after both, so a cold
 * jobs page on a slow link waits one round trip less (loaders only warm the query cache). quietAuth: without a
 * session the parent loader sends the visitor to sign-in, and this request must not add a "session expired"
 * notice of its own.
 */
export function warmJobsList({ request }: LoaderFunctionArgs) {
  void queryClient.prefetchQuery(jobsQuery(jobListParams(new URL(request.url).searchParams), { quietAuth: true }));
  return null;
}
