/**
 * The first code a signed-in visit needs: the frame and the jobs list, where every visit after sign-in lands.
 * Every other signed-in page is imported from here rather than from the router. The bundler then knows this
 * chunk is already in memory when such a page loads, so whatever a page shares with the frame and the jobs list
 * stays in this one chunk instead of being cut into dozens of small shared files that a cold jobs page would
 * fetch one by one.
 *
 * Add a new signed-in page here and reference it from router.tsx with `inFrame((p) => p.<name>)`.
 */
export { AppLayout } from './app-layout';
export { JobsRoute } from '../routes/jobs/jobs.route';

export const pages = {
  bookIn: () => import('../routes/jobs/book-in.route'),
  job: () => import('../routes/jobs/job.route'),
  capture: () => import('../routes/jobs/capture.route'),
  annotate: () => import('../routes/jobs/annotate.route'),
  scope: () => import('../routes/jobs/scope.route'),
  customers: () => import('../routes/customers/customers.route'),
  customersImport: () => import('../routes/customers/import.route'),
  customer: () => import('../routes/customers/customer.route'),
  bike: () => import('../routes/bikes/bike.route'),
  showcase: () => import('../routes/showcase/showcase.route'),
  users: () => import('../routes/settings/users.route'),
  shopSettings: () => import('../routes/settings/shop.route'),
  data: () => import('../routes/settings/data.route'),
  work: () => import('../routes/settings/work.route'),
  password: () => import('../routes/account/password.route'),
};
