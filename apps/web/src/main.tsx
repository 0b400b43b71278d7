import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router';
import { sessionKey } from './features/auth';
import { AppProvider } from './app/provider';
import { createRouter } from './app/router';
import { handleSessionLost } from './lib/api-client';
import { startServiceWorker } from './lib/app-update';
import { startOfflineCache } from './lib/offline-cache';
import { queryClient } from './lib/query-client';

// Opened with no connection: the last signed-in user's kept answers come back before the first loader asks for the
// session, and queries wait for the connection meanwhile.
await startOfflineCache(queryClient);

const router = createRouter();

// A 401 on a signed-in call: drop the cached session and go to sign-in with a clear reason.
handleSessionLost(() => {
  queryClient.setQueryData(sessionKey, null);
  const here = window.location.pathname + window.location.search;
  if (!window.location.pathname.startsWith('/sign-in')) void router.navigate(`/sign-in?reason=expired&next=${encodeURIComponent(here)}`);
});

startServiceWorker();

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <AppProvider>
      <RouterProvider router={router} />
    </AppProvider>
  </StrictMode>,
);
