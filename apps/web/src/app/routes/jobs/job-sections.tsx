import { lazy, Suspense, type ComponentType } from 'react';
import { BikeSpecs } from '../../../features/bikes';
import { IntakeSection } from '../../../features/jobs';
import type { SectionProps } from './sections/section-props';

export const JOB_SECTIONS = [
  { value: 'intake', label: 'Intake' },
  { value: 'inspection', label: 'Inspection' },
  { value: 'findings', label: 'Findings & estimate' },
  { value: 'work', label: 'Work & torque' },
  { value: 'media', label: 'Media' },
  { value: 'pairs', label: 'Pairs' },
  { value: 'report', label: 'Report' },
  { value: 'owner', label: 'Owner link' },
  { value: 'messages', label: 'Messages' },
  { value: 'payment', label: 'Payment' },
] as const;
export type JobSection = (typeof JOB_SECTIONS)[number]['value'];

/**
 * Every section but the intake (the first screen) loads when its tab is first opened, so a cold job page
 * does not fetch the charts, the photo tools, the pair builder or the report preview before it shows.
 */
const LAZY: Record<Exclude<JobSection, 'intake'>, ComponentType<SectionProps>> = {
  inspection: lazy(() => import('./sections/inspection-section')),
  findings: lazy(() => import('./sections/findings-section')),
  work: lazy(() => import('./sections/work-section')),
  media: lazy(() => import('./sections/media-section')),
  pairs: lazy(() => import('./sections/pairs-section')),
  report: lazy(() => import('./sections/report-section')),
  owner: lazy(() => import('./sections/owner-section')),
  messages: lazy(() => import('./sections/messages-section')),
  payment: lazy(() => import('./sections/payment-section')),
};

/** One section of the job page; each comes from its own feature. */
export function JobSectionBody({ section: s, ...props }: SectionProps & { section: JobSection }) {
  if (s === 'intake') return <IntakeSection job={props.job} bikeSpecs={<BikeSpecs bike={props.job.bikeDetail} />} />;
  const Body = LAZY[s];
  return (
    <Suspense fallback={null}>
      <Body {...props} />
    </Suspense>
  );
}
