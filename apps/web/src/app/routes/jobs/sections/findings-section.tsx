import { roleCan } from '@benchproof/contracts';
import { FindingsPanel } from '../../../../features/findings';
import { FindingMediaPicker } from '../../../../features/media';
import { useStaff } from '../../staff';
import type { SectionProps } from './section-props';

export default function FindingsSection({ job, me, settings, frozen }: SectionProps) {
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
