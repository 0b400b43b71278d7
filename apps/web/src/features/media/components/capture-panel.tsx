import type { MediaAssetDto } from '@benchproof/contracts';
import type { MediaSource } from '@benchproof/domain';
import { Group, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { useMedia } from '../api/media';
import { newItem, type ShotTags } from '../upload/queue';
import { uploadStore, useUploadQueue } from '../upload/upload-store';
import { AddFiles } from './add-files';
import { BulkTagBar } from './bulk-tag-bar';
import { ShotCard } from './shot-card';
import { StorageNotice } from './storage-notice';
import { OfflineNotice } from './offline-notice';

const DEFAULT_TAGS: ShotTags = { phase: 'before', area: 'whole_bike', caption: '' };

function QueueSummary({ done, total }: { done: number; total: number }) {
  if (!total) return <Text c="dimmed">No shots yet. Take some with the button above.</Text>;
  return (
    <Group justify="space-between">
      <Text fw={600} aria-live="polite">{`${done} of ${total} stored`}</Text>
    </Group>
  );
}

/** Phone-first capture: take or drop shots, tag them in bulk or one by one, watch each upload. */
export function CapturePanel({ jobId }: { jobId: number }) {
  const [tags, setTags] = useState<ShotTags>(DEFAULT_TAGS);
  const items = useUploadQueue(jobId).filter((i) => i.source !== 'scope');
  const { data: assets } = useMedia(jobId);
  const byId = new Map<number, MediaAssetDto>((assets ?? []).map((a) => [a.id, a]));

  const add = (files: File[], source: MediaSource) => uploadStore.dispatch({ type: 'add', items: files.map((f) => newItem(jobId, f, tags, { source })) });

  return (
    <Stack gap="md">
      <OfflineNotice />
      <StorageNotice />
      <AddFiles onFiles={add} />
      <BulkTagBar tags={tags} onTags={setTags} items={items} />
      <QueueSummary done={items.filter((i) => i.status === 'done').length} total={items.length} />
      <Stack gap="sm">
        {items.map((item) => (
          <ShotCard key={item.id} item={item} asset={item.assetId ? byId.get(item.assetId) : undefined} />
        ))}
      </Stack>
    </Stack>
  );
}
