import type { JobDetail } from '@benchproof/contracts';
import { Anchor, Badge, Group, Paper, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { IconMail, IconMessage, IconPhone } from '@tabler/icons-react';
import { Link } from 'react-router';
import { useUpdateJob } from '../api/jobs';
import { JobActions } from './job-actions';
import { MechanicBox } from './job-header-lazy';
import type { Option } from './job-filters';
import { jobBikeLabel } from './job-label';
import { JobStatusBadge } from './job-status-badge';
import { PromisedDate } from './promised-date';
import classes from './jobs.module.css';

const PREFERS = { email: 'prefers e-mail', phone: 'prefers a call', sms: 'prefers a text' } as const;

function Owner({ job }: { job: JobDetail }) {
  const c = job.customerDetail;
  return (
    <Stack gap={0}>
      <Text size="xs" tt="uppercase" c="dimmed" fw={700}>
        Owner · {PREFERS[c.preferredChannel]}
      </Text>
      <Anchor component={Link} to={`/customers/${c.id}`} fw={600} className={classes.contact}>
        {c.name}
      </Anchor>
      {c.phone && (
        <Anchor href={`tel:${c.phone}`} size="sm" className={classes.contact}>
          <Group gap={4} component="span" wrap="nowrap">
            <IconPhone size={16} />
            {c.phone}
          </Group>
        </Anchor>
      )}
      {c.phone && c.preferredChannel === 'sms' && (
        <Anchor href={`sms:${c.phone}`} size="sm" className={classes.contact}>
          <Group gap={4} component="span" wrap="nowrap">
            <IconMessage size={16} />
            Send a text
          </Group>
        </Anchor>
      )}
      {c.email && (
        <Anchor href={`mailto:${c.email}`} size="sm" className={classes.contact} style={{ wordBreak: 'break-all' }}>
          <Group gap={4} component="span" wrap="nowrap">
            <IconMail size={16} />
            {c.email}
          </Group>
        </Anchor>
      )}
    </Stack>
  );
}

function Mechanic({ job, mechanics, canAssign }: { job: JobDetail; mechanics: Option[]; canAssign: boolean }) {
  const update = useUpdateJob(job.id);
  if (!canAssign) {
    return (
      <Stack gap={2}>
        <Text size="xs" tt="uppercase" c="dimmed" fw={700}>
          Mechanic
        </Text>
        <Text>{job.mechanic?.name ?? 'Not assigned'}</Text>
      </Stack>
    );
  }
  return (
    <MechanicBox
      mechanics={mechanics}
      value={job.mechanic ? String(job.mechanic.id) : null}
      onChange={(v) => update.mutate({ mechanicId: v ? Number(v) : null })}
      disabled={update.isPending}
      error={update.error?.message}
    />
  );
}

/** The job's header: bike, owner and contact, status, promised day, mechanic, and the moves. */
export function JobHeader({ job, mechanics, canAssign }: { job: JobDetail; mechanics: Option[]; canAssign: boolean }) {
  return (
    <Paper withBorder p="md" radius="md" mb="md">
      <Stack gap="md">
        <Stack gap={2} miw={0}>
          <Group gap="xs">
            <Text fw={700} c="dimmed">
              Job {job.number}
            </Text>
            <JobStatusBadge status={job.status} size="lg" />
            {job.collectedWithoutReport && (
              <Badge color="orange" variant="outline" size="lg" radius="sm" style={{ textTransform: 'none' }}>
                Left without a report
              </Badge>
            )}
          </Group>
          <Title order={2}>
            <Anchor component={Link} to={`/bikes/${job.bike.id}`} inherit c="inherit">
              {jobBikeLabel(job)}
            </Anchor>
          </Title>
        </Stack>
        <SimpleGrid cols={{ base: 1, xs: 3 }} spacing="md">
          <Owner job={job} />
          <Stack gap={2}>
            <Text size="xs" tt="uppercase" c="dimmed" fw={700}>
              Promised
            </Text>
            <PromisedDate promisedOn={job.promisedOn} overdue={job.overdue} size="md" />
          </Stack>
          <Mechanic job={job} mechanics={mechanics} canAssign={canAssign} />
        </SimpleGrid>
        <JobActions job={job} />
      </Stack>
    </Paper>
  );
}
