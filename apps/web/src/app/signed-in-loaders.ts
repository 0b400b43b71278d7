// The signed-in area's loaders in one chunk, fetched by the router on the first signed-in visit: the sign-in and
// owner pages never load the access policy, the shop settings query or the jobs list's query code.
export { requireAction, requireSession } from './guards';
export { warmJobsList } from './routes/jobs/jobs.loader';
