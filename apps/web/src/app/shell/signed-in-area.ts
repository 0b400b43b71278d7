/**
 * The first code a signed-in visit needs: the frame and the jobs list, where every visit after sign-in lands.
 *
 * Every other signed-in page is imported from here (the route table names it; `pageModule` finds it) rather than
 * from the router. The bundler then knows this chunk is already in memory when such a page loads, so whatever a
 * page shares with the frame and the jobs list stays in this one chunk instead of being cut into dozens of small
 * shared files that a cold page would fetch one by one (over HTTP/1.1 a browser fetches six at a time).
 */
import { JobsRoute } from '../routes/jobs/jobs.route';

export { AppLayout } from './app-layout';

/** Pages that come with the frame itself. */
const WITH_FRAME: Record<string, Record<string, unknown>> = { 'jobs/jobs': { JobsRoute } };

/** The signed-in pages' modules (`app/routes/<area>/<page>.route.tsx`); public pages load from the router. */
const PAGE_MODULES = import.meta.glob<Record<string, unknown>>([
  '../routes/**/*.route.tsx',
  '!../routes/{accounts,auth,errors,owner,verify}/**',
  '!../routes/jobs/jobs.route.tsx',
]);

/** Loads `app/routes/<file>.route.tsx` (e.g. `jobs/job`). */
export async function pageModule(file: string): Promise<Record<string, unknown>> {
  if (WITH_FRAME[file]) return WITH_FRAME[file];
  const load = PAGE_MODULES[`../routes/${file}.route.tsx`];
  if (!load) throw new Error(`No signed-in page module app/routes/${file}.route.tsx`);
  return load();
}
