import type { BackupList } from '@benchproof/contracts';
import { Alert, Button, Card, Code, List, Stack, Text, Title } from '@mantine/core';
import { IconDatabaseExport } from '@tabler/icons-react';
import { QueryState } from '../../../components/query-state';
import { useDates } from '../../../lib/dates';
import { fileSize } from '../../../lib/file-size';
import { useBackUpNow, useBackups } from '../api/backups';

function schedule(list: BackupList): string {
  const where = list.storage === 's3' ? 'the storage bucket' : 'the server’s uploads folder';
  const when = list.everyHours > 0 ? `A backup is made every ${list.everyHours} hours` : 'Backups are made only when someone asks for one';
  return `${when}; the newest ${list.keep} are kept, in ${where}.`;
}

function BackupRows({ list }: { list: BackupList }) {
  const dates = useDates();
  if (list.backups.length === 0) return <Text c="dimmed">No backup yet.</Text>;
  return (
    <Stack gap="xs" component="ul" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Backups">
      {list.backups.map((b) => (
        <Card component="li" withBorder padding="sm" key={b.id} data-testid="backup">
          <Text fw={600}>{dates.dateTime(b.createdAt)}</Text>
          <Text size="sm">
            Records {fileSize(b.databaseBytes)}; refers to {b.files} stored {b.files === 1 ? 'file' : 'files'} ({fileSize(b.fileBytes)})
          </Text>
          <Text size="xs" c="dimmed">
            Name: {b.id}
          </Text>
        </Card>
      ))}
    </Stack>
  );
}

/** Backups for the manager: when and how big, "Back up now", and what a restore means (a server command, not a button). */
export function BackupsPanel() {
  const list = useBackups();
  const now = useBackUpNow();
  return (
    <Stack gap="sm">
      <Title order={3}>Backups</Title>
      {list.data && <Text size="sm">{schedule(list.data)}</Text>}
      <Button size="lg" leftSection={<IconDatabaseExport />} loading={now.isPending} onClick={() => now.mutate()}>
        Back up now
      </Button>
      {now.error && (
        <Alert color="red" role="alert">
          {now.error.message}
        </Alert>
      )}
      {now.data && (
        <Alert color="teal" role="status">
          Backup made: records {fileSize(now.data.databaseBytes)}, {now.data.files} stored files listed.
        </Alert>
      )}
      {list.data ? <BackupRows list={list.data} /> : <QueryState isLoading={list.isLoading} error={list.error} />}
      <Alert color="gray" title="What a restore means">
        <List size="sm" spacing={4}>
          <List.Item>A restore puts every record of the server back as it was at one backup. Anything saved after that backup is not in it.</List.Item>
          <List.Item>Photos and reports are not copied into a backup: it lists them, and the restore checks each one is still there and unchanged.</List.Item>
          <List.Item>
            Restoring is not done from this screen. Whoever runs your server does it on a fresh machine with the command <Code>npm run restore</Code> and the
            backup’s name shown above.
          </List.Item>
        </List>
      </Alert>
    </Stack>
  );
}
