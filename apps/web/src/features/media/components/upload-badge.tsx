import { Badge } from '@mantine/core';
import { IconCloudUpload, IconWifiOff } from '@tabler/icons-react';
import { useOnline, useWaitingCount } from '../upload/frame-shots';

const waitingText = (n: number) => `${n} ${n === 1 ? 'shot' : 'shots'} waiting`;

/** In the header: how many shots wait to be sent, and whether the phone is offline. Hidden when there is nothing to say. */
export function UploadBadge() {
  const waiting = useWaitingCount();
  const online = useOnline();
  if (online && waiting === 0) return null;
  const label = online ? waitingText(waiting) : `Offline, ${waitingText(waiting)}`;
  return (
    <Badge
      size="lg"
      variant="light"
      style={{ flexShrink: 0, overflow: 'visible' }}
      color={online ? 'brass' : 'red'}
      leftSection={online ? <IconCloudUpload size={18} /> : <IconWifiOff size={18} />}
      aria-label={label}
      title={label}
      role="status"
      data-testid="upload-badge"
      data-online={online}
      data-waiting={waiting}
    >
      {waiting}
    </Badge>
  );
}
