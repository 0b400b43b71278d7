import { ComingLater } from '../../../components/coming-later';

export function ShowcaseRoute() {
  return <ComingLater title="Showcase" arrivesWith="the showcase issue: consented before/after pairs, exported watermarked and metadata-free" />;
}
