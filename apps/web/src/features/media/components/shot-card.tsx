import type { MediaAssetDto } from '@benchproof/contracts';
import { MEDIA_AREA_LABELS, MEDIA_PHASE_LABELS } from '@benchproof/domain';
import { ActionIcon, Button, Checkbox, Collapse, Group, Paper, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPlayerPause, IconPlayerPlay, IconRefresh, IconTag, IconTrash } from '@tabler/icons-react';
import type { QueueItem, ShotTags } from '../upload/queue';
import { uploadStore } from '../upload/upload-store';
import { ShotPreview } from './shot-preview';
import { ShotProgress, ShotStatusBadge } from './shot-status';
import { TagEditor } from './tag-controls';

function ShotActions({ item }: { item: QueueItem }) {
  const { id, status } = item;
  const name = item.file.name;
  return (
    <Group gap={6} wrap="nowrap">
      {(status === 'uploading' || status === 'queued' || status === 'waiting_retry') && (
        <ActionIcon size={44} variant="light" aria-label={`Pause ${name}`} onClick={() => uploadStore.dispatch({ type: 'pause', id })}>
          <IconPlayerPause />
        </ActionIcon>
      )}
      {status === 'paused' && (
        <ActionIcon size={44} variant="light" aria-label={`Resume ${name}`} onClick={() => uploadStore.dispatch({ type: 'resume', id })}>
          <IconPlayerPlay />
        </ActionIcon>
      )}
      {(status === 'failed' || status === 'waiting_retry') && (
        <ActionIcon size={44} variant="light" color="brass" aria-label={`Retry ${name}`} onClick={() => uploadStore.dispatch({ type: 'retryNow', id })}>
          <IconRefresh />
        </ActionIcon>
      )}
      {status !== 'done' && status !== 'uploading' && (
        <ActionIcon size={44} variant="subtle" color="gray" aria-label={`Remove ${name}`} onClick={() => uploadStore.remove(id)}>
          <IconTrash />
        </ActionIcon>
      )}
    </Group>
  );
}

const summary = (t: ShotTags) => `${MEDIA_PHASE_LABELS[t.phase]} · ${MEDIA_AREA_LABELS[t.area]}${t.caption ? ` · ${t.caption}` : ''}`;

/** One shot in the queue: preview, progress, tags (editable one by one) and its controls. */
export function ShotCard({ item, asset }: { item: QueueItem; asset?: MediaAssetDto }) {
  const [editing, { toggle }] = useDisclosure(false);
  const name = item.file.name;
  const tag = (patch: Partial<ShotTags>) => uploadStore.dispatch({ type: 'tag', ids: [item.id], patch });
  return (
    <Paper withBorder p="sm" radius="md" data-testid="shot-card" data-status={item.status}>
      <Group align="flex-start" wrap="nowrap" gap="sm">
        <Checkbox
          size="lg"
          mt={4}
          aria-label={`Select ${name}`}
          checked={item.selected}
          onChange={(e) => uploadStore.dispatch({ type: 'select', ids: [item.id], selected: e.currentTarget.checked })}
        />
        <ShotPreview file={item.file} asset={asset} />
        <Stack gap={6} style={{ flex: 1, minWidth: 0 }}>
          <Group justify="space-between" wrap="nowrap" gap={4}>
            <Text fw={600} truncate>
              {name}
            </Text>
            <ShotStatusBadge item={item} />
          </Group>
          <ShotProgress item={item} />
          <Text size="sm" c="dimmed" truncate>
            {summary(item.tags)}
          </Text>
        </Stack>
      </Group>
      <Group justify="space-between" mt="xs">
        <Button variant="subtle" leftSection={<IconTag size={18} />} onClick={toggle} aria-expanded={editing}>
          {editing ? 'Done tagging' : 'Tag this shot'}
        </Button>
        <ShotActions item={item} />
      </Group>
      <Collapse expanded={editing}>
        <TagEditor value={item.tags} onChange={tag} name={name} />
      </Collapse>
    </Paper>
  );
}
