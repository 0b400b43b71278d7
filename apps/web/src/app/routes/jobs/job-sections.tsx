import { roleCan, type JobDetail, type SessionUser, type ShopSettingsDto } from '@benchproof/contracts';
import { Stack } from '@mantine/core';
import { BikeSpecs } from '../../../features/bikes';
import { FindingsPanel } from '../../../features/findings';
import { InspectionPanel } from '../../../features/inspection';
import { FinalCheckPanel, IntakeSection } from '../../../features/jobs';
import { FindingMediaPicker, JobMediaSection } from '../../../features/media';
import { PairsPanel } from '../../../features/pairs';
import { OwnerLinkPanel } from '../../../features/owner';
import { ReportSection } from '../../../features/reports';
import { MessagesPanel, SendReportButton } from '../../../features/mail';
import { TorqueEntries, WorkEntries } from '../../../features/work-log';
import { useStaff } from '../staff';

export interface SectionProps {
  job: JobDetail;
  me: SessionUser;
  settings: ShopSettingsDto;
  /** Handed over and the caller may not correct evidence: editing controls are hidden. */
  frozen: boolean;
}

export const JOB_SECTIONS = [
  { value: 'intake', label: 'Intake' },
  { value: 'inspection', label: 'Inspection' },
  { value: 'findings', label: 'Findings & estimate' },
  { value: 'work', label: 'Work & torque' },
  { value: 'media', label: 'Media' },
  { value: 'pairs', label: 'Pairs' },
  { value: 'report', label: 'Report' },
  { value: 'owner', label: 'Owner link' },
  { value: 'messages', label: 'E-mails' },
] as const;
export type JobSection = (typeof JOB_SECTIONS)[number]['value'];

function Findings({ job, me, settings, frozen }: SectionProps) {
  const { staffName } = useStaff();
  return (
    <FindingsPanel
      jobId={job.id}
      rates={{ labourRateMinor: settings.labourRateMinor, taxRateBp: settings.taxRateBp, currency: settings.currency }}
      canDecide={roleCan(me.role, 'recommendations.decide') && !frozen}
      canEdit={roleCan(me.role, 'findings.edit') && !frozen}
      ownerName={job.customer.name}
      me={{ id: me.id, name: me.name }}
      staffName={staffName}
      evidence={(findingId) => <FindingMediaPicker jobId={job.id} findingId={findingId} canEdit={roleCan(me.role, 'findings.edit') && !frozen} />}
    />
  );
}

function Work({ job, me, frozen }: SectionProps) {
  const { checkers } = useStaff();
  return (
    <Stack gap="xl">
      <WorkEntries jobId={job.id} canRecord={roleCan(me.role, 'work_log.record') && !frozen} />
      <TorqueEntries jobId={job.id} canRecord={roleCan(me.role, 'work_log.record') && !frozen} />
      <FinalCheckPanel job={job} me={me} checkers={checkers} />
    </Stack>
  );
}

/** One section of the job page; each comes from its own feature. */
export function JobSectionBody({ section, ...props }: SectionProps & { section: JobSection }) {
  const { job, me, settings, frozen } = props;
  switch (section) {
    case 'intake':
      return <IntakeSection job={job} bikeSpecs={<BikeSpecs bike={job.bikeDetail} />} />;
    case 'inspection':
      return (
        <InspectionPanel
          jobId={job.id}
          chainPolicy={settings.chainLimits ?? undefined}
          lengthUnit={settings.units === 'imperial' ? 'in' : 'mm'}
          carbonFrame={job.bikeDetail.frameMaterial === 'carbon'}
          canRecord={roleCan(me.role, 'inspection.record') && !frozen}
        />
      );
    case 'findings':
      return <Findings {...props} />;
    case 'work':
      return <Work {...props} />;
    case 'media':
      // The media feature (features/media) owns this section.
      return <JobMediaSection jobId={job.id} canSeeDeleted={roleCan(me.role, 'media.view_deleted')} />;
    case 'pairs':
      return <PairsPanel jobId={job.id} canEdit={roleCan(me.role, 'pairs.edit') && !frozen} />;
    case 'report':
      // Mail (features/mail) adds "Send to owner" under each issued version.
      return (
        <ReportSection
          jobId={job.id}
          canIssue={roleCan(me.role, 'reports.issue')}
          extra={roleCan(me.role, 'reports.issue') ? (r) => <SendReportButton jobId={job.id} reportId={r.id} /> : undefined}
        />
      );
    case 'owner':
      return <OwnerLinkPanel jobId={job.id} canManage={roleCan(me.role, 'owner_links.manage')} ownerName={job.customer.name} />;
    case 'messages':
      // The mail feature (features/mail) owns this section: delivery status and resend.
      return <MessagesPanel jobId={job.id} canResend={roleCan(me.role, 'reports.issue')} />;
  }
}
