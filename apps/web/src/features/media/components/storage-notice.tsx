import { Alert } from '@mantine/core';
import { IconDeviceSdCard } from '@tabler/icons-react';
import { useEffect, useState } from 'react';
import { askPersistentStorage, estimateStorage, megabytes, roomIsLow, roomLeft, type StorageEstimateLike } from '../upload/storage-room';
import { useWaitingCount } from '../upload/upload-store';

/**
 * On the capture screen: asks the browser to keep this site's storage (waiting shots live there), and warns
 * before the phone runs out of room for more, checked again whenever the number of waiting shots changes.
 */
export function StorageNotice() {
  const waiting = useWaitingCount();
  const [estimate, setEstimate] = useState<StorageEstimateLike | null>(null);
  useEffect(() => {
    void askPersistentStorage();
  }, []);
  useEffect(() => {
    let live = true;
    void estimateStorage().then((e) => live && setEstimate(e));
    return () => {
      live = false;
    };
  }, [waiting]);
  if (!roomIsLow(estimate)) return null;
  return (
    <Alert color="brass" variant="light" icon={<IconDeviceSdCard />} title="This phone is nearly full" data-testid="storage-notice">
      {`Room left for waiting shots: about ${megabytes(roomLeft(estimate) ?? 0)}. Let the waiting shots upload, or free some space on the phone, before taking many more.`}
    </Alert>
  );
}
