import { createBrowserRouter, Navigate, type RouteObject } from 'react-router';
import { requireRole, requireSession } from './guards';
import { SignInRoute } from './routes/auth/sign-in.route';
import { BikeRoute } from './routes/bikes/bike.route';
import { CustomerRoute } from './routes/customers/customer.route';
import { CustomersRoute } from './routes/customers/customers.route';
import { NotFoundRoute } from './routes/errors/not-found.route';
import { RouteError } from './routes/errors/route-error';
import { BookInRoute } from './routes/jobs/book-in.route';
import { CaptureRoute } from './routes/jobs/capture.route';
import { JobRoute } from './routes/jobs/job.route';
import { JobsRoute } from './routes/jobs/jobs.route';
import { ScopeRoute } from './routes/jobs/scope.route';
import { ShopSettingsRoute } from './routes/settings/shop.route';
import { UsersRoute } from './routes/settings/users.route';
import { ShowcaseRoute } from './routes/showcase/showcase.route';
import { AppLayout } from './shell/app-layout';

/** Pages inside the signed-in frame. Features meet here; add new pages to this list. */
const signedIn: RouteObject[] = [
  { index: true, element: <Navigate to="/jobs" replace /> },
  { path: 'jobs', element: <JobsRoute /> },
  { path: 'jobs/new', loader: requireRole('manager', 'desk'), element: <BookInRoute /> },
  { path: 'jobs/:jobId', element: <JobRoute /> },
  { path: 'jobs/:jobId/capture', element: <CaptureRoute /> },
  { path: 'jobs/:jobId/scope', element: <ScopeRoute /> },
  { path: 'customers', element: <CustomersRoute /> },
  { path: 'customers/:customerId', element: <CustomerRoute /> },
  { path: 'bikes/:bikeId', element: <BikeRoute /> },
  { path: 'showcase', loader: requireRole('manager'), element: <ShowcaseRoute /> },
  { path: 'settings/users', loader: requireRole('manager'), element: <UsersRoute /> },
  { path: 'settings/shop', loader: requireRole('manager'), element: <ShopSettingsRoute /> },
  { path: '*', element: <NotFoundRoute /> },
];

export const routes: RouteObject[] = [
  { path: '/sign-in', element: <SignInRoute />, errorElement: <RouteError /> },
  {
    path: '/',
    loader: requireSession,
    element: <AppLayout />,
    errorElement: <RouteError />,
    children: signedIn.map((r) => ({ ...r, errorElement: <RouteError /> })),
  },
];

export const createRouter = () => createBrowserRouter(routes);
