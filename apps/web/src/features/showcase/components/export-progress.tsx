import type { ShowcaseExportTaskDto } from '@benchproof/contracts';
import { Alert, Button, Group, Paper, Progress, Stack, Text } from '@mantine/core';
import { IconDownload } from '@tabler/icons-react';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { downloadFinishedExport, useExportTask } from '../api/showcase';
import { exportFailure } from './export-failure';

interface Props {
  /** What the server answered when the export was queued. */
  start: ShowcaseExportTaskDto;
  files: number;
  onDismiss: () => void;
}

/** The finished zip: one button; a refusal at download time (consent withdrawn since) shows under it. */
function ReadyToDownload({ taskKey, files, onDismiss }: { taskKey: string; files: number; onDismiss: () => void }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const get = async () => {
    setBusy(true);
    setError(null);
    try {
      await downloadFinishedExport(taskKey);
    } catch (e) {
      setError(e instanceof ApiError ? exportFailure(e.code, e.message).message : 'The download failed. Try again.');
    } finally {
      setBusy(false);
    }
  };
  return (
    <Stack gap={6}>
      <Text fw={600}>Your zip of {files} files is ready.</Text>
      <Group>
        <Button size="md" leftSection={<IconDownload size={20} />} loading={busy} onClick={() => void get()}>
          Download zip
        </Button>
        <Button size="md" variant="subtle" color="gray" onClick={onDismiss}>
          Close
        </Button>
      </Group>
      {error && (
        <Text c="red" size="sm" role="alert">
          {error}
        </Text>
      )}
    </Stack>
  );
}

/** A background export on screen: progress while it runs, then the download, or why it stopped. */
export function ExportProgress({ start, files, onDismiss }: Props) {
  const { data: task, error } = useExportTask(start);
  if (task.state === 'failed' || error) {
    const why = error instanceof ApiError ? exportFailure(error.code, error.message) : exportFailure(task.code, task.error);
    return (
      <Alert color="red" title={why.title} role="alert" withCloseButton closeButtonLabel="Close" onClose={onDismiss}>
        {why.message}
      </Alert>
    );
  }
  const made = Math.min(files, Math.floor(task.progress * files));
  return (
    <Paper withBorder p="sm" radius="md">
      {task.state === 'done' ? (
        <ReadyToDownload taskKey={task.key} files={files} onDismiss={onDismiss} />
      ) : (
        <Stack gap={6} role="status">
          <Text fw={600}>{task.state === 'queued' ? 'Waiting to start the zip…' : `Making the zip: ${made} of ${files} files`}</Text>
          <Progress size="xl" radius="md" value={Math.max(2, task.progress * 100)} striped animated aria-label="Zip progress" />
          <Text size="sm" c="dimmed">
            Made on the server; keep this page open to download it.
          </Text>
        </Stack>
      )}
    </Paper>
  );
}
