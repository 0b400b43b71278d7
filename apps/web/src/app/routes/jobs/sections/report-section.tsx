import { roleCan } from '@benchproof/contracts';
import { SendReportButton } from '../../../../features/mail';
import { ReportSection as Reports } from '../../../../features/reports';
import type { SectionProps } from './section-props';

// Mail (features/mail) adds "Send to owner" under each issued version.
export default function ReportSection({ job, me }: SectionProps) {
  return (
    <Reports
      jobId={job.id}
      canIssue={roleCan(me.role, 'reports.issue')}
      extra={roleCan(me.role, 'reports.issue') ? (r) => <SendReportButton jobId={job.id} reportId={r.id} /> : undefined}
    />
  );
}
