import { Alert } from '@mantine/core';
import { useDiskSpace } from '../api/disk-space';

const MB = 1024 * 1024;
const size = (bytes: number | null) =>
  bytes === null ? 'unknown' : bytes >= 1024 * MB ? `${(bytes / 1024 / MB).toFixed(1)} GB` : `${Math.floor(bytes / MB)} MB`;

/**
 * The manager's warning before a disk fills: once it is full, uploads and saves are refused
 * (STORAGE_FULL) until space is freed. Nothing shows while there is room.
 */
export function DiskSpaceWarning() {
  const { data } = useDiskSpace();
  if (!data?.low) return null;
  const places = [
    data.database.low && `the database disk has ${size(data.database.freeBytes)} free`,
    data.uploads.low && `the photo and video disk has ${size(data.uploads.freeBytes)} free`,
  ].filter(Boolean);
  return (
    <Alert color="orange" title="The server is running out of disk space" role="alert" data-testid="disk-space-warning" mb="md">
      On the server, {places.join(' and ')}. When a disk is full, new photos, videos and records cannot be saved. Free space or add storage soon.
    </Alert>
  );
}

export default DiskSpaceWarning;
