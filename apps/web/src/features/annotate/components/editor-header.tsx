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

/** The editor's top bar: back, title, save state, save now and download. */
export function EditorHeader({ backTo, title, save, onExport }: Props) {
  const [label, colour] = SAVE_LABEL[save.state];
  return (
    <Group justify="space-between" p={6} c="white" wrap="nowrap">
      <Group gap="xs" wrap="nowrap" style={{ minWidth: 0 }}>
        <ActionIcon component={Link} to={backTo} size={48} variant="subtle" color="gray.0" aria-label="Back">
          <IconArrowLeft />
        </ActionIcon>
        <Text fw={600} truncate>
          {title}
        </Text>
      </Group>
      <Group gap="xs" wrap="nowrap">
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
