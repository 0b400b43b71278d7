import type { LoaderFunctionArgs } from 'react-router';
import { sessionKey } from '../../../features/auth';
import { jobListParams, jobsQuery } from '../../../features/jobs';
import { queryClient } from '../../../lib/query-client';

/**
 * On a cold visit, starts the jobs list request beside the session check and the page's code instead of after
 * both, so a jobs page on a slow link waits one round trip less (loaders only warm the query cache). quietAuth:
 * without a session the parent loader sends the visitor to sign-in, and this request must not add a "session
 * expired" notice of its own. Once the session is known the table fetches for itself, so a session that ends
 * while the list is open still takes the user to sign-in.
 */
export function warmJobsList({ request }: LoaderFunctionArgs) {
  if (queryClient.getQueryData(sessionKey) === undefined) {
    void queryClient.prefetchQuery(jobsQuery(jobListParams(new URL(request.url).searchParams), { quietAuth: true }));
  }
  return null;
}
