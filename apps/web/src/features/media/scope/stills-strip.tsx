import type { MediaAssetDto } from '@benchproof/contracts';
import { Group, Paper, ScrollArea, Stack, Text } from '@mantine/core';
import { useMedia } from '../api/media';
import { ShotPreview } from '../components/shot-preview';
import { ShotProgress, ShotStatusBadge } from '../components/shot-status';
import type { QueueItem } from '../upload/queue';
import { useUploadQueue } from '../upload/upload-store';

function StillCard({ item, asset }: { item: QueueItem; asset?: MediaAssetDto }) {
  return (
    <Paper withBorder p={6} radius="md" w={120} data-testid="scope-still" data-status={item.status}>
      <Stack gap={4} align="center">
        <ShotPreview file={item.file} asset={asset} />
        <ShotStatusBadge item={item} />
        <div style={{ width: '100%' }}>
          <ShotProgress item={item} />
        </div>
      </Stack>
    </Paper>
  );
}

/** The stills grabbed on this page, newest first, each with its own upload state. */
export function StillsStrip({ jobId }: { jobId: number }) {
  const stills = useUploadQueue(jobId)
    .filter((i) => i.source === 'scope')
    .reverse();
  const { data } = useMedia(jobId);
  const byId = new Map((data ?? []).map((a) => [a.id, a]));
  if (!stills.length)
    return (
      <Text c="dimmed" size="sm">
        Grabbed stills appear here.
      </Text>
    );
  return (
    <ScrollArea type="auto" offsetScrollbars>
      <Group gap="sm" wrap="nowrap" aria-label="Grabbed stills">
        {stills.map((s) => (
          <StillCard key={s.id} item={s} asset={s.assetId ? byId.get(s.assetId) : undefined} />
        ))}
      </Group>
    </ScrollArea>
  );
}
