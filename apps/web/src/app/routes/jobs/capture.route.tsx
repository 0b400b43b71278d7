import { CapturePanel } from '../../../features/media';
import { JobMediaFrame, jobPagePath, useJobIdParam } from './job-media-frame';

/** Phone-first capture for one job: take shots, tag them, watch them upload. */
export function CaptureRoute() {
  const jobId = useJobIdParam();
  return (
    <JobMediaFrame jobId={jobId} title="Add shots" back={jobPagePath(jobId)}>
      <CapturePanel jobId={jobId} />
    </JobMediaFrame>
  );
}
