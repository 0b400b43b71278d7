import { roleCan } from '@benchproof/contracts';
import { OwnerLinkPanel } from '../../../../features/owner-links';
import { TakeDownList } from '../../../../features/showcase';
import type { SectionProps } from './section-props';

export default function OwnerSection({ job, me }: SectionProps) {
  // The take-down list (showcase.manage) sits in the consent card, where a withdrawal says to take photos down.
  const takeDown = roleCan(me.role, 'showcase.manage') ? (withdrawn: boolean) => <TakeDownList jobId={job.id} withdrawn={withdrawn} /> : undefined;
  return <OwnerLinkPanel jobId={job.id} canManage={roleCan(me.role, 'owner_links.manage')} ownerName={job.customer.name} takeDown={takeDown} />;
}
