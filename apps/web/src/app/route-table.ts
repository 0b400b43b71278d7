import type { Action } from '@benchproof/contracts';
import type { ComponentType } from 'react';

/** The menu's icons by name, so this table (in the first file every visit loads) carries no icon code. */
export type MenuIcon = 'jobs' | 'customers' | 'showcase' | 'users' | 'shop' | 'data' | 'work';

/**
 * One page of the app. The router, the signed-in menu, the role guards and the page titles are all read from
 * this one entry: adding a page is adding a line to PAGES below (see DEVELOPERS.md, "Adding a feature").
 */
export interface PageRoute {
  /** Relative to the signed-in frame (`jobs/:jobId`) or absolute for pages outside it (`/sign-in`). */
  path: string;
  /** The browser tab's title: `<title> · BenchProof`. */
  title: string;
  /** The page's code, fetched on the first visit (React Router `lazy`). */
  load: () => Promise<ComponentType>;
  /** The ACCESS_POLICY action the page needs: other roles are sent to `/jobs?denied=<action>`, and the menu hides it. */
  action?: Action;
  /** An entry in the signed-in menu, in the order of this table. */
  menu?: { label: string; icon: MenuIcon };
  /**
   * Work the router does before the page shows: `jobs-list` starts the list request beside the session check on a
   * cold visit (routes/jobs/jobs.loader.ts); `setup-check` opens the setup screen on a server with no workshop yet.
   */
  prepare?: 'jobs-list' | 'setup-check';
}

/** A page's component, picked from its module once that module has loaded. */
const lazyPage =
  <M>(load: () => Promise<M>, pick: (m: M) => ComponentType) =>
  async () =>
    pick(await load());

/**
 * A signed-in page: `app/routes/<file>.route.tsx`'s export `name`, loaded through the frame's chunk
 * (shell/signed-in-area.ts says why). route-table.test.ts checks that each file exports its component.
 */
const inFrame = (file: string, name: string) => async () => {
  const page = (await (await import('./shell/signed-in-area')).pageModule(file))[name];
  if (typeof page !== 'function') throw new Error(`app/routes/${file}.route.tsx exports no ${name}`);
  return page as ComponentType;
};

/** Pages inside the signed-in frame (session required); the jobs list comes with the frame. */
export const SIGNED_IN_PAGES: PageRoute[] = [
  {
    path: 'jobs',
    title: 'Jobs',
    load: inFrame('jobs/jobs', 'JobsRoute'),
    menu: { label: 'Jobs', icon: 'jobs' },
    prepare: 'jobs-list',
  },
  {
    path: 'jobs/new',
    title: 'Book a bike in',
    load: inFrame('jobs/book-in', 'BookInRoute'),
    action: 'jobs.book_in',
  },
  {
    path: 'jobs/:jobId',
    title: 'Job',
    load: inFrame('jobs/job', 'JobRoute'),
  },
  {
    path: 'jobs/:jobId/capture',
    title: 'Capture',
    load: inFrame('jobs/capture', 'CaptureRoute'),
  },
  {
    path: 'jobs/:jobId/media/:mediaId/annotate',
    title: 'Annotate',
    load: inFrame('jobs/annotate', 'AnnotateRoute'),
  },
  {
    path: 'jobs/:jobId/scope',
    title: 'Scope',
    load: inFrame('jobs/scope', 'ScopeRoute'),
  },
  {
    path: 'customers',
    title: 'Customers & bikes',
    load: inFrame('customers/customers', 'CustomersRoute'),
    menu: { label: 'Customers & bikes', icon: 'customers' },
  },
  {
    path: 'customers/import',
    title: 'Import customers',
    load: inFrame('customers/import', 'ImportRoute'),
    action: 'customers.import',
  },
  {
    path: 'customers/:customerId',
    title: 'Customer',
    load: inFrame('customers/customer', 'CustomerRoute'),
  },
  {
    path: 'bikes/:bikeId',
    title: 'Bike',
    load: inFrame('bikes/bike', 'BikeRoute'),
  },
  {
    path: 'showcase',
    title: 'Showcase',
    load: inFrame('showcase/showcase', 'ShowcaseRoute'),
    // The policy's action, narrowed by the shop's desk switch (shop-access.ts).
    action: 'showcase.view',
    menu: { label: 'Showcase', icon: 'showcase' },
  },
  {
    path: 'settings/users',
    title: 'Users & roles',
    load: inFrame('settings/users', 'UsersRoute'),
    action: 'users.manage',
    menu: { label: 'Users & roles', icon: 'users' },
  },
  {
    path: 'settings/shop',
    title: 'Shop settings',
    load: inFrame('settings/shop', 'ShopSettingsRoute'),
    action: 'shop.edit',
    menu: { label: 'Shop settings', icon: 'shop' },
  },
  {
    path: 'settings/data',
    title: 'Backups & export',
    load: inFrame('settings/data', 'DataRoute'),
    action: 'backups.manage',
    menu: { label: 'Backups & export', icon: 'data' },
  },
  {
    path: 'settings/work',
    title: 'Failed work',
    load: inFrame('settings/work', 'WorkRoute'),
    action: 'work.retry',
    menu: { label: 'Failed work', icon: 'work' },
  },
  {
    path: 'account/password',
    title: 'Change password',
    load: inFrame('account/password', 'PasswordRoute'),
  },
];

/** Pages outside the frame: sign-in, links from e-mails, the owner page, public report checks. */
export const PUBLIC_PAGES: PageRoute[] = [
  {
    path: '/sign-in',
    title: 'Sign in',
    prepare: 'setup-check',
    load: lazyPage(
      () => import('./routes/auth/sign-in.route'),
      (m) => m.SignInRoute,
    ),
  },
  {
    path: '/o/:token',
    title: 'Your bike',
    load: lazyPage(
      () => import('./routes/owner/owner.route'),
      (m) => m.OwnerRoute,
    ),
  },
  // Public: a warranty desk or insurer checks a report without an account.
  {
    path: '/verify',
    title: 'Check a report',
    load: lazyPage(
      () => import('./routes/verify/verify.route'),
      (m) => m.VerifyRoute,
    ),
  },
  {
    path: '/setup',
    title: 'Set up your workshop',
    load: lazyPage(
      () => import('./routes/accounts/setup.route'),
      (m) => m.SetupRoute,
    ),
  },
  {
    path: '/signup',
    title: 'Sign up',
    load: lazyPage(
      () => import('./routes/accounts/setup.route'),
      (m) => m.SignupRoute,
    ),
  },
  {
    path: '/signup/confirm',
    title: 'Confirm sign-up',
    load: lazyPage(
      () => import('./routes/accounts/links.route'),
      (m) => m.ConfirmSignupRoute,
    ),
  },
  {
    path: '/join',
    title: 'Join your workshop',
    load: lazyPage(
      () => import('./routes/accounts/links.route'),
      (m) => m.JoinRoute,
    ),
  },
  {
    path: '/reset-password',
    title: 'Choose a new password',
    load: lazyPage(
      () => import('./routes/accounts/links.route'),
      (m) => m.ResetPasswordRoute,
    ),
  },
  {
    path: '/forgot-password',
    title: 'Forgot password',
    load: lazyPage(
      () => import('./routes/accounts/links.route'),
      (m) => m.ForgotPasswordRoute,
    ),
  },
];

/** The signed-in menu: the table's pages that carry a `menu` entry, in table order. */
export const MENU = SIGNED_IN_PAGES.flatMap((p) => (p.menu ? [{ to: `/${p.path}`, action: p.action, ...p.menu }] : []));
export type MenuEntry = (typeof MENU)[number];

const APP_NAME = 'BenchProof';
/** The document title of the deepest matched page that has one (none: the app's name alone). */
export function documentTitle(matches: readonly { handle?: unknown }[]): string {
  const titled = matches.map((m) => (m.handle as Pick<PageRoute, 'title'> | undefined)?.title).filter(Boolean);
  const title = titled[titled.length - 1];
  return title ? `${title} · ${APP_NAME}` : APP_NAME;
}
