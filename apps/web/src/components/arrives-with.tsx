import { Alert } from '@mantine/core';
import { IconClockHour4 } from '@tabler/icons-react';

/** A section of a page that is not built yet: says which work brings it, shows no fake data. */
export function ArrivesWith({ what }: { what: string }) {
  return (
    <Alert icon={<IconClockHour4 />} color="gray" variant="light" title="Not built yet">
      This section arrives with {what}. Nothing shown here is real data.
    </Alert>
  );
}
