import { ActionIcon, Group, Stack, Text, Title } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { Link, useParams } from 'react-router';
import { useJob } from '../../../features/jobs';

/** The job id from the URL; the media pages all hang off /jobs/:jobId. */
export function useJobIdParam(): number {
  const { jobId } = useParams();
  return Number(jobId);
}

/** Where "back" goes from the capture and scope pages: the media section of the job page. */
export const jobPagePath = (jobId: number) => `/jobs/${jobId}?section=media`;

/** A compact page frame for the phone-first media pages: back arrow, title, which job. */
export function JobMediaFrame({ jobId, title, back, children }: { jobId: number; title: string; back: string; children: ReactNode }) {
  const { data: job } = useJob(jobId);
  return (
    <Stack gap="md" maw={960} mx="auto">
      <Group gap="sm" wrap="nowrap">
        <ActionIcon component={Link} to={back} size={48} variant="light" aria-label="Back to the job">
          <IconArrowLeft />
        </ActionIcon>
        <div style={{ minWidth: 0 }}>
          <Title order={2}>{title}</Title>
          <Text c="dimmed" truncate>
            {job ? `${job.number} · ${job.bike.maker} ${job.bike.model} · ${job.customer.name}` : `Job ${jobId}`}
          </Text>
        </div>
      </Group>
      {children}
    </Stack>
  );
}
