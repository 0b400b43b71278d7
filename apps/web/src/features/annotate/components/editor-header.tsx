import { ActionIcon, Badge, Button, Group, Text } from '@mantine/core';
import { IconArrowLeft, IconDownload } from '@tabler/icons-react';
import { Link } from 'react-router';
import type { SaveState, useAutosave } from './use-autosave';

const SAVE_LABEL: Record<SaveState, [string, string]> = {
  saved: ['Saved', 'green'],
  dirty: ['Unsaved changes', 'yellow'],
  saving: ['Saving…', 'blue'],
  conflict: ['Changed elsewhere: reload', 'red'],
  error: ['Not saved: retrying on next change', 'red'],
};

interface Props {
  backTo: string;
  title: string;
  save: ReturnType<typeof useAutosave>;
  onExport: () => void;
}

/**
 * The editor's top bar: back, title, save state, save now and download. The title keeps at least
 * 14rem, so on a phone the actions wrap onto a second row instead of being pushed off screen, and
 * the title wraps to two lines before it is cut.
 */
export function EditorHeader({ backTo, title, save, onExport }: Props) {
  const [label, colour] = SAVE_LABEL[save.state];
  return (
    <Group justify="space-between" gap="xs" p={6} c="white" wrap="wrap">
      <Group gap="xs" wrap="nowrap" style={{ minWidth: 0, flex: '1 1 14rem' }}>
        <ActionIcon component={Link} to={backTo} size={48} variant="subtle" color="gray.0" aria-label="Back">
          <IconArrowLeft />
        </ActionIcon>
        <Text fw={600} lineClamp={2}>
          {title}
        </Text>
      </Group>
      <Group gap="xs" wrap="wrap" justify="flex-end" ml="auto">
        <Badge color={colour} size="lg" data-testid="save-state">
          {label}
        </Badge>
        <Button size="md" h={48} onClick={() => void save.flush()} disabled={save.state === 'saved'}>
          Save
        </Button>
        <ActionIcon size={48} variant="light" aria-label="Download the annotated image" onClick={onExport}>
          <IconDownload />
        </ActionIcon>
      </Group>
    </Group>
  );
}
