import { Alert } from '@mantine/core';
import { IconLock } from '@tabler/icons-react';
import { JOB_CLOSED_MESSAGE } from '../lib/messages';

/**
 * A handed-over job's records are frozen (the API answers JOB_CLOSED). Those who may
 * still correct them are told that every change is recorded; the others see why the
 * editing controls are gone.
 */
export function FrozenNotice({ canCorrect }: { canCorrect: boolean }) {
  return (
    <Alert color="gray" variant="light" icon={<IconLock />} title="Records frozen" mb="md" role="status">
      {canCorrect
        ? 'This job was handed over; its records are frozen for everyone else. You can still correct them — every change you make is recorded.'
        : JOB_CLOSED_MESSAGE}
    </Alert>
  );
}
