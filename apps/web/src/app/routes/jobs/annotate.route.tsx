import { useParams } from 'react-router';
import { AnnotateEditor } from '../../../features/annotate';
import { useJob } from '../../../features/jobs';
import { jobPagePath } from './job-media-frame';

/** Full-screen editor over one photo or scope still of a job. */
export function AnnotateRoute() {
  const { jobId, mediaId } = useParams();
  const job = useJob(Number(jobId));
  const id = Number(mediaId);
  const title = job.data ? `${job.data.number} · ${job.data.bike.maker} ${job.data.bike.model}` : `Job ${jobId}`;
  return <AnnotateEditor mediaId={id} imageUrl={`/api/media/${id}/screen`} backTo={jobPagePath(Number(jobId))} title={title} />;
}
