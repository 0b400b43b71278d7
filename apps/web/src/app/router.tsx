import type { Action } from '@benchproof/contracts';
import { createBrowserRouter, Navigate, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import { LazyRouteError as RouteError } from './routes/errors/lazy-route-error';
import { documentTitle, PUBLIC_PAGES, SIGNED_IN_PAGES, type PageRoute } from './route-table';
import { redirectToSetup } from './setup-redirect';

type Loaders = typeof import('./signed-in-loaders');
/** A signed-in loader, fetched with its chunk on first use (see signed-in-loaders.ts). */
const loader = (pick: (l: Loaders) => (args: LoaderFunctionArgs) => unknown) => async (args: LoaderFunctionArgs) =>
  pick(await import('./signed-in-loaders'))(args);
const requireSession = loader((l) => l.requireSession);
const requireAction = (action: Action) => loader((l) => l.requireAction(action));
const PREPARE = { 'jobs-list': loader((l) => l.warmJobsList), 'setup-check': redirectToSetup } as const;

/** A route-table entry as a React Router route: the guard or preparation as its loader, the code `lazy`, the title in `handle`. */
function toRoute(page: PageRoute): RouteObject {
  return {
    path: page.path,
    loader: page.action ? requireAction(page.action) : page.prepare && PREPARE[page.prepare],
    lazy: async () => ({ Component: await page.load() }),
    handle: { title: page.title },
    errorElement: <RouteError />,
  };
}

const notFound: RouteObject = {
  path: '*',
  handle: { title: 'Page not found' },
  lazy: async () => ({ Component: (await import('./routes/errors/not-found.route')).NotFoundRoute }),
  errorElement: <RouteError />,
};

/** Every route, derived from the route table (route-table.ts): add pages there, not here. */
export const routes: RouteObject[] = [
  ...PUBLIC_PAGES.map(toRoute),
  {
    path: '/',
    loader: requireSession,
    // The frame loads with the first signed-in page, never on the sign-in page.
    lazy: async () => ({ Component: (await import('./shell/signed-in-area')).AppLayout }),
    errorElement: <RouteError />,
    children: [{ index: true, element: <Navigate to="/jobs" replace /> }, ...SIGNED_IN_PAGES.map(toRoute), notFound],
  },
];

/** The router; the browser tab's title follows the page shown (its route-table title). */
export function createRouter() {
  const router = createBrowserRouter(routes);
  const showTitle = () => (document.title = documentTitle(router.state.matches.map((m) => m.route)));
  router.subscribe(showTitle);
  showTitle();
  return router;
}
