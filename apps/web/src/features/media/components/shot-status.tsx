import { Badge, Progress, Text } from '@mantine/core';
import { OFFLINE_CODE, type QueueItem } from '../upload/queue';

const LABEL: Record<QueueItem['status'], string> = {
  saving: 'Keeping',
  queued: 'Waiting',
  uploading: 'Sending',
  paused: 'Paused',
  waiting_retry: 'Retrying',
  done: 'Stored',
  failed: 'Failed',
};
const COLOUR: Record<QueueItem['status'], string> = {
  saving: 'gray',
  queued: 'gray',
  uploading: 'bench',
  paused: 'gray',
  waiting_retry: 'brass',
  done: 'green',
  failed: 'red',
};

export function ShotStatusBadge({ item }: { item: QueueItem }) {
  return (
    <Badge color={COLOUR[item.status]} variant={item.status === 'done' ? 'filled' : 'light'} size="lg" style={{ flexShrink: 0 }}>
      {LABEL[item.status]}
    </Badge>
  );
}

/** A progress bar per shot, with the server's message when it was not stored. */
export function ShotProgress({ item }: { item: QueueItem }) {
  const pct = Math.round(item.progress * 100);
  return (
    <>
      <Progress
        value={pct}
        size="lg"
        radius="xl"
        color={item.status === 'failed' ? 'red' : item.status === 'done' ? 'green' : 'bench'}
        animated={item.status === 'uploading'}
        aria-label={`Upload of ${item.file.name}`}
        aria-valuenow={pct}
      />
      {item.error && item.status !== 'done' && <ShotError item={item} />}
    </>
  );
}

/** The server's words; a full server disk is said plainly and loudly, since only the manager can fix it. */
function ShotError({ item }: { item: QueueItem }) {
  const full = item.errorCode === 'STORAGE_FULL';
  const loud = item.status === 'failed' || full;
  return (
    <Text size="sm" c={loud ? 'red.8' : 'dimmed'} role={loud ? 'alert' : undefined}>
      {item.error}
      {full && ' This shot stays here and is sent again every minute.'}
      {!full && item.errorCode !== OFFLINE_CODE && item.status === 'waiting_retry' && ` Trying again (attempt ${item.attempts + 1}).`}
    </Text>
  );
}
