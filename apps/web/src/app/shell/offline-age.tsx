import { Alert } from '@mantine/core';
import { IconWifiOff } from '@tabler/icons-react';
import { onlineManager, useQueryClient } from '@tanstack/react-query';
import { useEffect, useState, useSyncExternalStore } from 'react';
import { ageText, oldestShown } from '../../lib/data-age';

const isOnline = () => onlineManager.isOnline();
const onOnlineChange = (fn: () => void) => onlineManager.subscribe(fn);

/** Offline: says that the page shows what this phone last saw, and how old that is (redrawn every half minute). */
export function OfflineAge() {
  const qc = useQueryClient();
  const online = useSyncExternalStore(onOnlineChange, isOnline);
  const oldest = useSyncExternalStore(
    (fn) => qc.getQueryCache().subscribe(fn),
    () => oldestShown(qc),
  );
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (online) return;
    const first = setTimeout(() => setNow(Date.now()), 0);
    const timer = setInterval(() => setNow(Date.now()), 30_000);
    return () => {
      clearTimeout(first);
      clearInterval(timer);
    };
  }, [online]);
  if (online) return null;
  return (
    <Alert color="orange" icon={<IconWifiOff size={20} />} role="status" data-testid="offline-age" mb="sm">
      {oldest
        ? `Offline, last updated ${ageText(Math.max(0, now - oldest))}. Showing what this phone last saw.`
        : 'Offline. Nothing kept on this phone for this page yet.'}
    </Alert>
  );
}
