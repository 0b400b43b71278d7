import { roleCan } from '@benchproof/contracts';
import { AnnotatedStill } from '../../../../features/annotate';
import { JobMediaSection } from '../../../../features/media';
import type { SectionProps } from './section-props';

// The media feature (features/media) owns this section; the annotate feature draws stills in its viewer
// (an "Annotated" sign and a switch between the photo and its annotated render).
export default function MediaSection({ job, me }: SectionProps) {
  return (
    <JobMediaSection
      jobId={job.id}
      canSeeDeleted={roleCan(me.role, 'media.view_deleted')}
      renderStill={(a) => <AnnotatedStill key={a.id} mediaId={a.id} screenUrl={a.urls.screen} alt={a.caption || `Shot ${a.id}`} />}
    />
  );
}
