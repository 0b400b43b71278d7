import type { JobDetail } from '@benchproof/contracts';
import { Paper, Stack, Text, Title } from '@mantine/core';
import dayjs from 'dayjs';
import type { ReactNode } from 'react';

/** What the owner told us at booking-in; the bike's specs are plugged in by the route. */
export function IntakeSection({ job, bikeSpecs }: { job: JobDetail; bikeSpecs: ReactNode }) {
  return (
    <Stack>
      <Paper withBorder p="md">
        <Title order={3} size="h4" mb="xs">
          Reported symptoms
        </Title>
        <Text size="xs" c="dimmed" mb="xs">
          Booked in {dayjs(job.createdAt).format('D MMM YYYY, HH:mm')} — in the owner's words
        </Text>
        <Text style={{ whiteSpace: 'pre-wrap' }}>{job.reportedSymptoms || 'Nothing recorded.'}</Text>
      </Paper>
      <Paper withBorder p="md">
        <Title order={3} size="h4" mb="xs">
          Bike
        </Title>
        {bikeSpecs}
      </Paper>
    </Stack>
  );
}
