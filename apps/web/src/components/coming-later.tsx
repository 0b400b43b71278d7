import { Alert, Stack, Title } from '@mantine/core';
import { IconClockHour4 } from '@tabler/icons-react';

/** Says plainly that a section is not built yet — no fake data. */
export function ComingLater({ title, arrivesWith }: { title: string; arrivesWith: string }) {
  return (
    <Stack>
      <Title order={2}>{title}</Title>
      <Alert icon={<IconClockHour4 />} color="gray" variant="light" title="Not built yet">
        This section arrives with {arrivesWith}. Nothing shown here is real data.
      </Alert>
    </Stack>
  );
}
