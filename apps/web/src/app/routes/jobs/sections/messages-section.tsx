import { roleCan } from '@benchproof/contracts';
import { MessagesPanel } from '../../../../features/mail';
import type { SectionProps } from './section-props';

// The mail feature (features/mail) owns this section: delivery status and resend.
export default function MessagesSection({ job, me }: SectionProps) {
  return <MessagesPanel jobId={job.id} canResend={roleCan(me.role, 'reports.issue')} />;
}
