import type { QueryClient } from '@tanstack/react-query';

/** How old the shown data is, in words a mechanic reads at a glance ("just now", "12 min ago", "3 h ago", "2 days ago"). */
export function ageText(ms: number): string {
  const min = Math.floor(ms / 60_000);
  if (min < 1) return 'just now';
  if (min < 60) return `${min} min ago`;
  const hours = Math.floor(min / 60);
  if (hours < 24) return `${hours} h ago`;
  const days = Math.floor(hours / 24);
  return days === 1 ? '1 day ago' : `${days} days ago`;
}

/**
 * When the oldest answer on screen was fetched (ms since the epoch), or 0 when nothing is shown: only queries a
 * mounted component reads count, and the session (who is signed in) is not page data.
 */
export function oldestShown(queryClient: QueryClient): number {
  const times = queryClient
    .getQueryCache()
    .getAll()
    .filter((q) => q.getObserversCount() > 0 && q.state.data !== undefined && q.queryKey[0] !== 'session')
    .map((q) => q.state.dataUpdatedAt);
  return times.length ? Math.min(...times) : 0;
}
