import { roleCan } from '@benchproof/contracts';
import { OwnerLinkPanel } from '../../../../features/owner-links';
import type { SectionProps } from '../job-sections';

export default function OwnerSection({ job, me }: SectionProps) {
  return <OwnerLinkPanel jobId={job.id} canManage={roleCan(me.role, 'owner_links.manage')} ownerName={job.customer.name} />;
}
