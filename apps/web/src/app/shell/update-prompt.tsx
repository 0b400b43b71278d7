import { Button, Group, Paper, Text } from '@mantine/core';
import { useLocation } from 'react-router';
import { useWaitingCount } from '../../features/media';
import { applyUpdate, useUpdateReady } from '../../lib/app-update';

/** Pages where an update would interrupt a mechanic mid-shot: the prompt waits until they leave. */
const CAPTURING = /\/(capture|scope|annotate)(\/|$)/;

/** "A new version is ready": updates on the user's tap only, and never shows on the capture screens. */
export function UpdatePrompt() {
  const ready = useUpdateReady();
  const { pathname } = useLocation();
  const waiting = useWaitingCount();
  if (!ready || CAPTURING.test(pathname)) return null;
  return (
    <Paper withBorder shadow="md" p="sm" radius="md" role="status" data-testid="update-prompt">
      <Group justify="space-between" wrap="nowrap">
        <Text size="sm">{waiting ? 'A new version is ready. Shots waiting on this phone are kept.' : 'A new version of BenchProof is ready.'}</Text>
        <Button size="md" style={{ flexShrink: 0 }} onClick={() => void applyUpdate()}>
          Update
        </Button>
      </Group>
    </Paper>
  );
}
