import { lazy, Suspense } from 'react';
import classes from './lazy-route-error.module.css';

/** Plain markup for when even the error page's code cannot be fetched (the connection dropped). */
function OfflineError() {
  return (
    <main className={classes.page}>
      <h2>This page hit a snag</h2>
      <p>The page could not be loaded. Check the connection and reload.</p>
      <button type="button" className={classes.reload} onClick={() => window.location.reload()}>
        Reload
      </button>
    </main>
  );
}

// The error page (Alert, Title, Center) is fetched only when a route fails, not with every first screen.
const RouteErrorPage = lazy(() =>
  import('./route-error').then(
    (m) => ({ default: m.RouteError }),
    () => ({ default: OfflineError }),
  ),
);

/** Route error boundary that loads the error page on first use. */
export function LazyRouteError() {
  return (
    <Suspense fallback={null}>
      <RouteErrorPage />
    </Suspense>
  );
}
