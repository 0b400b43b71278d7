import { ComingLater } from '../../../components/coming-later';

export function JobsRoute() {
  return <ComingLater title="Jobs" arrivesWith="the workshop records issue: booking-in, the jobs table and the job page" />;
}
