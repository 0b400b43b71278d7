import { useEffect, useRef } from 'react';

/**
 * Listens to the job's owner events (Server-Sent Events) and calls `onEvent`
 * for each, so the job page shows the owner's decisions within a second or so
 * without a reload. EventSource reconnects by itself after a dropped line.
 */
export function useOwnerEvents(jobId: number, onEvent: () => void): void {
  const handler = useRef(onEvent);
  useEffect(() => {
    handler.current = onEvent;
  }, [onEvent]);
  useEffect(() => {
    if (typeof EventSource === 'undefined' || !Number.isFinite(jobId)) return;
    const source = new EventSource(`/api/jobs/${jobId}/owner-events`, { withCredentials: true });
    const listener = () => handler.current();
    source.addEventListener('owner', listener);
    return () => {
      source.removeEventListener('owner', listener);
      source.close();
    };
  }, [jobId]);
}
