import type { JobDto } from '@benchproof/contracts';
import { JOB_STATUS_LABELS } from '@benchproof/domain';
import { Anchor, Badge, Group, Paper, Table, Text } from '@mantine/core';
import { Link } from 'react-router';
import { useDates } from '../../../lib/dates';

function VisitRow({ job }: { job: JobDto }) {
  const dates = useDates();
  return (
    <Table.Tr>
      <Table.Td>
        <Anchor component={Link} to={`/jobs/${job.id}`} fw={700}>
          {job.number}
        </Anchor>
      </Table.Td>
      <Table.Td>{dates.date(job.createdAt)}</Table.Td>
      <Table.Td>
        <Group gap={4}>
          <Badge variant="light" radius="sm">
            {JOB_STATUS_LABELS[job.status]}
          </Badge>
          {job.overdue && (
            <Text size="sm" fw={700} c="red.8">
              Overdue
            </Text>
          )}
        </Group>
      </Table.Td>
      <Table.Td>{job.mechanic?.name ?? '—'}</Table.Td>
    </Table.Tr>
  );
}

/** The bike's jobs, one row each, linking to the job page. */
export function BikeVisitsTable({ jobs }: { jobs: JobDto[] }) {
  return (
    <Paper withBorder>
      <Table.ScrollContainer minWidth={480}>
        <Table verticalSpacing="sm">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Job</Table.Th>
              <Table.Th>Booked in</Table.Th>
              <Table.Th>Status</Table.Th>
              <Table.Th>Mechanic</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {jobs.map((j) => (
              <VisitRow key={j.id} job={j} />
            ))}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
    </Paper>
  );
}
