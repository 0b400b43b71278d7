import type { JobDto } from '@benchproof/contracts';
import { Card, Group, Stack, Text, UnstyledButton } from '@mantine/core';
import { IconChevronRight } from '@tabler/icons-react';
import { Link } from 'react-router';
import { formatMoney } from '@benchproof/domain';
import { jobBikeLabel } from './job-label';
import { JobStatusBadge } from './job-status-badge';
import { PromisedDate } from './promised-date';
import classes from './jobs.module.css';

/**
 * The jobs list on a phone: one big tappable card per job. The card's own words are its name (no aria-label):
 * a spoken name that differs from the visible text fails voice control ("tap J-2026-0001", WCAG 2.5.3).
 */
export function JobCards({ jobs, currency }: { jobs: JobDto[]; currency: string }) {
  return (
    <Stack gap="sm">
      {jobs.map((job) => (
        <UnstyledButton key={job.id} component={Link} to={`/jobs/${job.id}`}>
          <Card withBorder padding="md" className={job.overdue ? classes.overdueCard : undefined}>
            <Group justify="space-between" wrap="nowrap" align="flex-start">
              <Stack gap={4} miw={0}>
                <Group gap="xs">
                  <Text fw={700}>{job.number}</Text>
                  <JobStatusBadge status={job.status} />
                </Group>
                <Text fw={600} truncate>
                  {jobBikeLabel(job)}
                </Text>
                <Text size="sm" c="dimmed" truncate>
                  {job.customer.name} · {job.mechanic?.name ?? 'No mechanic yet'}
                </Text>
                <PromisedDate promisedOn={job.promisedOn} overdue={job.overdue} />
                {job.dueMinor !== null && job.dueMinor > 0 && (
                  <Text size="sm" fw={600}>
                    Due {formatMoney(job.dueMinor, currency)}
                  </Text>
                )}
              </Stack>
              <IconChevronRight aria-hidden />
            </Group>
          </Card>
        </UnstyledButton>
      ))}
    </Stack>
  );
}
