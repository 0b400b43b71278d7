import { roleCan } from '@benchproof/contracts';
import { JobMediaSection } from '../../../../features/media';
import type { SectionProps } from '../job-sections';

// The media feature (features/media) owns this section.
export default function MediaSection({ job, me }: SectionProps) {
  return <JobMediaSection jobId={job.id} canSeeDeleted={roleCan(me.role, 'media.view_deleted')} />;
}
