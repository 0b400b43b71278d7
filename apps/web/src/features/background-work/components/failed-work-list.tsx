import type { FailedWork } from '@benchproof/contracts';
import { Alert, Button, Card, Group, Stack, Text } from '@mantine/core';
import { IconCircleCheck, IconRefresh } from '@tabler/icons-react';
import { Link } from 'react-router';
import { QueryState } from '../../../components/query-state';
import { useDates } from '../../../lib/dates';
import { useFailedWork, useRetryWork } from '../api/failed-work';
import { workWhat, workWhy } from './work-words';

function FailedWorkCard({ work }: { work: FailedWork }) {
  const dates = useDates();
  const retry = useRetryWork();
  const what = workWhat(work.kind);
  return (
    <Card withBorder padding="md" data-testid="failed-work" aria-label={what}>
      <Stack gap={6}>
        <Text fw={600}>{what}</Text>
        {work.jobId === null && <Text size="sm">Not tied to a job</Text>}
        <Text size="sm">Why: {workWhy(work.lastError)}</Text>
        {work.lastError && (
          <Text size="xs" c="dimmed" style={{ overflowWrap: 'anywhere' }}>
            Server message: {work.lastError}
          </Text>
        )}
        <Text size="sm">
          Failed {dates.dateTime(work.failedAt)} after {work.attempts} {work.attempts === 1 ? 'try' : 'tries'}.
          {work.nextTryAt ? ` It tries again by itself ${dates.dateTime(work.nextTryAt)}.` : ' It will not try again by itself.'}
        </Text>
        {retry.error && (
          <Alert color="red" role="alert">
            {retry.error.message}
          </Alert>
        )}
        <Group>
          {work.jobId !== null && (
            <Button size="lg" variant="default" component={Link} to={`/jobs/${work.jobId}`}>
              Job {work.jobNumber}
            </Button>
          )}
          <Button size="lg" leftSection={<IconRefresh />} loading={retry.isPending} onClick={() => retry.mutate(work.id)}>
            Try again now
          </Button>
        </Group>
      </Stack>
    </Card>
  );
}

/** The manager's list of background work that failed (thumbnails, reports, e-mails), each with "Try again now". */
export function FailedWorkList() {
  const list = useFailedWork();
  if (!list.data) return <QueryState isLoading={list.isLoading} error={list.error} />;
  if (list.data.length === 0)
    return (
      <Alert color="teal" icon={<IconCircleCheck />} title="Nothing has failed">
        Photo previews, reports and e-mails are all done or on their way.
      </Alert>
    );
  return (
    <Stack gap="sm">
      {list.data.map((w) => (
        <FailedWorkCard key={w.id} work={w} />
      ))}
    </Stack>
  );
}
