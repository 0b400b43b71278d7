import { roleCan } from '@benchproof/contracts';
import { Stack } from '@mantine/core';
import { MessagesPanel, TextsPanel } from '../../../../features/mail';
import type { SectionProps } from './section-props';

// The mail feature (features/mail) owns this section: e-mail and text delivery status, e-mail resend.
export default function MessagesSection({ job, me }: SectionProps) {
  return (
    <Stack gap="xl">
      <TextsPanel jobId={job.id} />
      <MessagesPanel jobId={job.id} canResend={roleCan(me.role, 'reports.issue')} />
    </Stack>
  );
}
