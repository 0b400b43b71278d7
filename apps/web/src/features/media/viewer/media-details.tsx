import type { MediaAssetDto } from '@benchproof/contracts';
import { MEDIA_AREA_LABELS, MEDIA_KIND_LABELS, MEDIA_PHASE_LABELS, MEDIA_SOURCE_LABELS } from '@benchproof/domain';
import { Badge, Group, Stack, Text, Tooltip } from '@mantine/core';
import { useDates } from '../../../lib/dates';

const clock = (ms: number) => `${Math.floor(ms / 60000)}:${((ms % 60000) / 1000).toFixed(2).padStart(5, '0')}`;

/** What the shot is: tags, caption, when it was taken, and the fingerprint of the original. */
export function MediaDetails({ asset }: { asset: MediaAssetDto }) {
  const dates = useDates();
  return (
    <Stack gap={4} data-testid="media-details">
      <Group gap={6}>
        <Badge size="lg" variant="filled">
          {MEDIA_PHASE_LABELS[asset.phase]}
        </Badge>
        <Badge size="lg" variant="light">
          {MEDIA_AREA_LABELS[asset.area]}
        </Badge>
        <Badge size="lg" variant="outline" color="gray">{`${MEDIA_KIND_LABELS[asset.kind]} · ${MEDIA_SOURCE_LABELS[asset.source]}`}</Badge>
      </Group>
      {asset.caption && <Text fw={600}>{asset.caption}</Text>}
      <Text size="sm" c="dimmed">
        {asset.capturedAt ? `Taken ${dates.dateTime(asset.capturedAt)}` : `Uploaded ${dates.dateTime(asset.uploadedAt)}`}
        {asset.width && asset.height ? ` · ${asset.width}×${asset.height}` : ''}
        {asset.timecodeMs !== null ? ` · at ${clock(asset.timecodeMs)} of video ${asset.sourceAssetId}` : ''}
      </Text>
      <Tooltip label={asset.sha256} multiline w={320}>
        <Text size="xs" c="dimmed" ff="monospace" w="fit-content">{`SHA-256 ${asset.sha256.slice(0, 12)}…`}</Text>
      </Tooltip>
      {asset.deletedAt && <Text size="sm" c="red.8">{`Deleted ${dates.dateTime(asset.deletedAt)}`}</Text>}
    </Stack>
  );
}
