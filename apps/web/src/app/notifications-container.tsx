import '@mantine/notifications/styles.css';
import { Notifications } from '@mantine/notifications';

export default function NotificationsContainer() {
  return <Notifications position="top-center" />;
}
