import { roleCan } from '@benchproof/contracts';
import { PairsPanel } from '../../../../features/pairs';
import type { SectionProps } from './section-props';

export default function PairsSection({ job, me, frozen }: SectionProps) {
  return <PairsPanel jobId={job.id} canEdit={roleCan(me.role, 'pairs.edit') && !frozen} />;
}
