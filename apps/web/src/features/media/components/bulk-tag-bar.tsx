import { Button, Group, Paper, Stack, Text, Title } from '@mantine/core';
import type { QueueItem, ShotTags } from '../upload/queue';
import { uploadStore } from '../upload/upload-store';
import { TagEditor } from './tag-controls';

/**
 * The tags new shots get, and the same tags applied in one go to the selected shots
 * (or all of them when none is selected).
 */
export function BulkTagBar({ tags, onTags, items }: { tags: ShotTags; onTags: (t: ShotTags) => void; items: QueueItem[] }) {
  const selected = items.filter((i) => i.selected);
  const targets = selected.length ? selected : items;
  const allSelected = items.length > 0 && selected.length === items.length;
  const apply = () => uploadStore.dispatch({ type: 'tag', ids: targets.map((i) => i.id), patch: tags });
  return (
    <Paper withBorder radius="md" p="md">
      <Stack gap="sm">
        <Title order={4}>Tags</Title>
        <Text size="sm" c="dimmed">
          New shots get these tags. Change them for the selected shots, or tag a shot on its own below.
        </Text>
        <TagEditor value={tags} onChange={(patch) => onTags({ ...tags, ...patch })} name="new and selected shots" />
        {items.length > 0 && (
          <Group grow>
            <Button
              variant="default"
              size="md"
              h={50}
              onClick={() => uploadStore.dispatch({ type: 'select', ids: items.map((i) => i.id), selected: !allSelected })}
            >
              {allSelected ? 'Select none' : 'Select all'}
            </Button>
            <Button size="md" h={50} onClick={apply}>
              {selected.length ? `Apply to ${selected.length} selected` : `Apply to all ${items.length}`}
            </Button>
          </Group>
        )}
      </Stack>
    </Paper>
  );
}
