import { useNotifications } from '@mantine/notifications';
import { lazy, Suspense, useState } from 'react';

// The toast container (with its transitions and styles) is fetched when the first toast is raised,
// not on every first visit; notifications.show() only touches the small store until then.
const Container = lazy(() => import('./notifications-container'));

export function NotificationsHost() {
  const { notifications, queue } = useNotifications();
  const [mounted, setMounted] = useState(false);
  const active = notifications.length + queue.length > 0;
  // Once mounted it stays, so a toast can play its exit transition.
  if (active && !mounted) setMounted(true);
  if (!active && !mounted) return null;
  return (
    <Suspense fallback={null}>
      <Container />
    </Suspense>
  );
}
