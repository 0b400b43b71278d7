import type { JobDetail } from '@benchproof/contracts';
import { Paper, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { useDates } from '../../../lib/dates';

/** What the owner told us at booking-in; the bike's specs are plugged in by the route. */
export function IntakeSection({ job, bikeSpecs }: { job: JobDetail; bikeSpecs: ReactNode }) {
  const dates = useDates();
  return (
    <Stack>
      <Paper withBorder p="md">
        <Title order={3} size="h4" mb="xs">
          Reported symptoms
        </Title>
        <Text size="xs" c="dimmed" mb="xs">
          Booked in {dates.dateTime(job.createdAt)} — in the owner's words
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
