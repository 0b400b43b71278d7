import { Alert } from '@mantine/core';
import { IconWifiOff } from '@tabler/icons-react';
import { useOnline } from '../upload/upload-store';

/** On the capture screen while offline: shots are kept and go when the connection returns. */
export function OfflineNotice() {
  const online = useOnline();
  if (online) return null;
  return (
    <Alert color="red" variant="light" icon={<IconWifiOff />} title="Offline" data-testid="offline-notice">
      Shots are kept on this phone and sent by themselves when the connection returns, even after the page is closed.
    </Alert>
  );
}
