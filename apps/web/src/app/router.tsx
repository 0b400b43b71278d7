import type { ComponentType } from 'react';
import type { Action } from '@benchproof/contracts';
import { createBrowserRouter, Navigate, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import { LazyRouteError as RouteError } from './routes/errors/lazy-route-error';
import { redirectToSetup } from './setup-redirect';

type Loaders = typeof import('./signed-in-loaders');
/** A signed-in loader, fetched with its chunk on first use (see signed-in-loaders.ts). */
const loader = (pick: (l: Loaders) => (args: LoaderFunctionArgs) => unknown) => async (args: LoaderFunctionArgs) =>
  pick(await import('./signed-in-loaders'))(args);
const warmJobsList = loader((l) => l.warmJobsList);
const requireSession = loader((l) => l.requireSession);
const requireShowcase = loader((l) => l.requireShowcase);
const requireAction = (action: Action) => loader((l) => l.requireAction(action));

/** Loads a page's code when it is first visited, so a phone downloads only what it opens. */
const page =
  <M,>(load: () => Promise<M>, pick: (m: M) => ComponentType) =>
  async () => ({ Component: pick(await load()) });

type Pages = (typeof import('./shell/signed-in-area'))['pages'];
/** A signed-in page, loaded through the signed-in area's chunk (see shell/signed-in-area.ts for why). */
const inFrame =
  <M,>(choose: (pages: Pages) => () => Promise<M>) =>
  async () =>
    choose((await import('./shell/signed-in-area')).pages)();

/** Pages inside the signed-in frame. Features meet here; add new pages to this list (their import goes in shell/signed-in-area.ts). */
const signedIn: RouteObject[] = [
  { index: true, element: <Navigate to="/jobs" replace /> },
  {
    path: 'jobs',
    loader: warmJobsList,
    lazy: page(
      () => import('./shell/signed-in-area'),
      (m) => m.JobsRoute,
    ),
  },
  {
    path: 'jobs/new',
    loader: requireAction('jobs.book_in'),
    lazy: page(
      inFrame((p) => p.bookIn),
      (m) => m.BookInRoute,
    ),
  },
  {
    path: 'jobs/:jobId',
    lazy: page(
      inFrame((p) => p.job),
      (m) => m.JobRoute,
    ),
  },
  {
    path: 'jobs/:jobId/capture',
    lazy: page(
      inFrame((p) => p.capture),
      (m) => m.CaptureRoute,
    ),
  },
  {
    path: 'jobs/:jobId/media/:mediaId/annotate',
    lazy: page(
      inFrame((p) => p.annotate),
      (m) => m.AnnotateRoute,
    ),
  },
  {
    path: 'jobs/:jobId/scope',
    lazy: page(
      inFrame((p) => p.scope),
      (m) => m.ScopeRoute,
    ),
  },
  {
    path: 'customers',
    lazy: page(
      inFrame((p) => p.customers),
      (m) => m.CustomersRoute,
    ),
  },
  {
    path: 'customers/import',
    loader: requireAction('customers.import'),
    lazy: page(
      inFrame((p) => p.customersImport),
      (m) => m.ImportRoute,
    ),
  },
  {
    path: 'customers/:customerId',
    lazy: page(
      inFrame((p) => p.customer),
      (m) => m.CustomerRoute,
    ),
  },
  {
    path: 'bikes/:bikeId',
    lazy: page(
      inFrame((p) => p.bike),
      (m) => m.BikeRoute,
    ),
  },
  {
    path: 'showcase',
    loader: requireShowcase,
    lazy: page(
      inFrame((p) => p.showcase),
      (m) => m.ShowcaseRoute,
    ),
  },
  {
    path: 'settings/users',
    loader: requireAction('users.manage'),
    lazy: page(
      inFrame((p) => p.users),
      (m) => m.UsersRoute,
    ),
  },
  {
    path: 'settings/shop',
    loader: requireAction('shop.edit'),
    lazy: page(
      inFrame((p) => p.shopSettings),
      (m) => m.ShopSettingsRoute,
    ),
  },
  {
    path: 'settings/data',
    loader: requireAction('backups.manage'),
    lazy: page(
      inFrame((p) => p.data),
      (m) => m.DataRoute,
    ),
  },
  {
    path: 'settings/work',
    loader: requireAction('work.retry'),
    lazy: page(
      inFrame((p) => p.work),
      (m) => m.WorkRoute,
    ),
  },
  {
    path: 'account/password',
    lazy: page(
      inFrame((p) => p.password),
      (m) => m.PasswordRoute,
    ),
  },
  {
    path: '*',
    lazy: page(
      () => import('./routes/errors/not-found.route'),
      (m) => m.NotFoundRoute,
    ),
  },
];

/** Pages reached from e-mailed links or before any account exists (features/auth). */
const accountPages: RouteObject[] = [
  {
    path: '/setup',
    lazy: page(
      () => import('./routes/accounts/setup.route'),
      (m) => m.SetupRoute,
    ),
  },
  {
    path: '/signup',
    lazy: page(
      () => import('./routes/accounts/setup.route'),
      (m) => m.SignupRoute,
    ),
  },
  {
    path: '/signup/confirm',
    lazy: page(
      () => import('./routes/accounts/links.route'),
      (m) => m.ConfirmSignupRoute,
    ),
  },
  {
    path: '/join',
    lazy: page(
      () => import('./routes/accounts/links.route'),
      (m) => m.JoinRoute,
    ),
  },
  {
    path: '/reset-password',
    lazy: page(
      () => import('./routes/accounts/links.route'),
      (m) => m.ResetPasswordRoute,
    ),
  },
  {
    path: '/forgot-password',
    lazy: page(
      () => import('./routes/accounts/links.route'),
      (m) => m.ForgotPasswordRoute,
    ),
  },
];

export const routes: RouteObject[] = [
  ...accountPages.map((r) => ({ ...r, errorElement: <RouteError /> })),
  {
    path: '/sign-in',
    // A server with no workshop yet opens on its setup screen instead.
    loader: redirectToSetup,
    lazy: page(
      () => import('./routes/auth/sign-in.route'),
      (m) => m.SignInRoute,
    ),
    errorElement: <RouteError />,
  },
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
    // The frame loads with the first signed-in page, never on the sign-in page.
    lazy: page(
      () => import('./shell/signed-in-area'),
      (m) => m.AppLayout,
    ),
    errorElement: <RouteError />,
    children: signedIn.map((r) => ({ ...r, errorElement: <RouteError /> })),
  },
];

export const createRouter = () => createBrowserRouter(routes);
