import type { ComponentType } from 'react';
import { createBrowserRouter, Navigate, type RouteObject } from 'react-router';
import { requireAction, requireSession, requireShowcase } from './guards';
import { SignInRoute } from './routes/auth/sign-in.route';
import { NotFoundRoute } from './routes/errors/not-found.route';
import { RouteError } from './routes/errors/route-error';
import { AppLayout } from './shell/app-layout';

/** Loads a page's code when it is first visited, so a phone downloads only what it opens. */
const page =
  <M,>(load: () => Promise<M>, pick: (m: M) => ComponentType) =>
  async () => ({ Component: pick(await load()) });

/** Pages inside the signed-in frame. Features meet here; add new pages to this list. */
const signedIn: RouteObject[] = [
  { index: true, element: <Navigate to="/jobs" replace /> },
  {
    path: 'jobs',
    lazy: page(
      () => import('./routes/jobs/jobs.route'),
      (m) => m.JobsRoute,
    ),
  },
  {
    path: 'jobs/new',
    loader: requireAction('jobs.book_in'),
    lazy: page(
      () => import('./routes/jobs/book-in.route'),
      (m) => m.BookInRoute,
    ),
  },
  {
    path: 'jobs/:jobId',
    lazy: page(
      () => import('./routes/jobs/job.route'),
      (m) => m.JobRoute,
    ),
  },
  {
    path: 'jobs/:jobId/capture',
    lazy: page(
      () => import('./routes/jobs/capture.route'),
      (m) => m.CaptureRoute,
    ),
  },
  {
    path: 'jobs/:jobId/media/:mediaId/annotate',
    lazy: page(
      () => import('./routes/jobs/annotate.route'),
      (m) => m.AnnotateRoute,
    ),
  },
  {
    path: 'jobs/:jobId/scope',
    lazy: page(
      () => import('./routes/jobs/scope.route'),
      (m) => m.ScopeRoute,
    ),
  },
  {
    path: 'customers',
    lazy: page(
      () => import('./routes/customers/customers.route'),
      (m) => m.CustomersRoute,
    ),
  },
  {
    path: 'customers/:customerId',
    lazy: page(
      () => import('./routes/customers/customer.route'),
      (m) => m.CustomerRoute,
    ),
  },
  {
    path: 'bikes/:bikeId',
    lazy: page(
      () => import('./routes/bikes/bike.route'),
      (m) => m.BikeRoute,
    ),
  },
  {
    path: 'showcase',
    loader: requireShowcase,
    lazy: page(
      () => import('./routes/showcase/showcase.route'),
      (m) => m.ShowcaseRoute,
    ),
  },
  {
    path: 'settings/users',
    loader: requireAction('users.manage'),
    lazy: page(
      () => import('./routes/settings/users.route'),
      (m) => m.UsersRoute,
    ),
  },
  {
    path: 'settings/shop',
    loader: requireAction('shop.edit'),
    lazy: page(
      () => import('./routes/settings/shop.route'),
      (m) => m.ShopSettingsRoute,
    ),
  },
  {
    path: 'account/password',
    lazy: page(
      () => import('./routes/account/password.route'),
      (m) => m.PasswordRoute,
    ),
  },
  { path: '*', element: <NotFoundRoute /> },
];

export const routes: RouteObject[] = [
  { path: '/sign-in', element: <SignInRoute />, errorElement: <RouteError /> },
  {
    path: '/o/:token',
    lazy: page(
      () => import('./routes/owner/owner.route'),
      (m) => m.OwnerRoute,
    ),
    errorElement: <RouteError />,
  },
  // Public: a warranty desk or insurer checks a report without an account.
  {
    path: '/verify',
    lazy: page(
      () => import('./routes/verify/verify.route'),
      (m) => m.VerifyRoute,
    ),
    errorElement: <RouteError />,
  },
  {
    path: '/',
    loader: requireSession,
    element: <AppLayout />,
    errorElement: <RouteError />,
    children: signedIn.map((r) => ({ ...r, errorElement: <RouteError /> })),
  },
];

export const createRouter = () => createBrowserRouter(routes);
