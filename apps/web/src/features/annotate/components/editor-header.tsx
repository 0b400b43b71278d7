import { ActionIcon, Badge, Button, Text } from '@mantine/core';
import { IconArrowLeft, IconDownload } from '@tabler/icons-react';
import { Link } from 'react-router';
import classes from './annotate-editor.module.css';
import type { SaveState, useAutosave } from './use-autosave';

// Light badges (dark text on a pale ground, theme.ts LIGHT_TEXT): white on green 6 was 2.7:1, under WCAG 1.4.3's 4.5:1.
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

/** The editor's one-row top bar: back, title (cut to one line), save state, save now and download. */
export function EditorHeader({ backTo, title, save, onExport }: Props) {
  const [label, colour] = SAVE_LABEL[save.state];
  return (
    <header className={classes.header}>
      <ActionIcon component={Link} to={backTo} size={44} variant="subtle" color="gray.0" aria-label="Back">
        <IconArrowLeft />
      </ActionIcon>
      <Text fw={600} size="sm" truncate="end" className={classes.title} title={title}>
        {title}
      </Text>
      <Badge color={colour} variant="light" size="md" maw="9.5rem" data-testid="save-state" title={label}>
        {label}
      </Badge>
      <Button size="sm" h={44} px="sm" onClick={() => void save.flush()} disabled={save.state === 'saved'}>
        Save
      </Button>
      <ActionIcon size={44} variant="subtle" color="gray.0" aria-label="Download the annotated image" onClick={onExport}>
        <IconDownload />
      </ActionIcon>
    </header>
  );
}
