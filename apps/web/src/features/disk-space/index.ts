import { lazy } from 'react';

/** Loads with the manager's first screen but outside its chunk (most visits never show it). */
export const DiskSpaceWarning = lazy(() => import('./components/disk-space-warning'));
