import { useSearchParams } from 'react-router';
import { ScopePanel } from '../../../features/media';
import { JobMediaFrame, jobPagePath, useJobIdParam } from './job-media-frame';

/** Scope stills for one job: live, or grabbed from a video (?video=<asset id>). */
export function ScopeRoute() {
  const jobId = useJobIdParam();
  const [params] = useSearchParams();
  const video = Number(params.get('video'));
  return (
    <JobMediaFrame jobId={jobId} title="Scope" back={jobPagePath(jobId)}>
      <ScopePanel jobId={jobId} videoId={Number.isInteger(video) && video > 0 ? video : null} />
    </JobMediaFrame>
  );
}
