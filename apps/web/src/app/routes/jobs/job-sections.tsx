import type { JobDetail, SessionUser, ShopSettingsDto } from '@benchproof/contracts';
import { lazy, Suspense, type ComponentType } from 'react';
import { BikeSpecs } from '../../../features/bikes';
import { IntakeSection } from '../../../features/jobs';

export interface SectionProps {
  job: JobDetail;
  me: SessionUser;
  settings: ShopSettingsDto;
  /** Handed over and the caller may not correct evidence: editing controls are hidden. */
  frozen: boolean;
}

export const JOB_SECTIONS = [
  { value: 'intake', label: 'Intake' },
  { value: 'inspection', label: 'Inspection' },
  { value: 'findings', label: 'Findings & estimate' },
  { value: 'work', label: 'Work & torque' },
  { value: 'media', label: 'Media' },
  { value: 'pairs', label: 'Pairs' },
  { value: 'report', label: 'Report' },
  { value: 'owner', label: 'Owner link' },
  { value: 'messages', label: 'E-mails' },
] as const;
export type JobSection = (typeof JOB_SECTIONS)[number]['value'];

const section = <M,>(load: () => Promise<M>, pick: (m: M) => ComponentType<SectionProps>) => lazy(async () => ({ default: pick(await load()) }));

/**
 * Every section but the intake (the first screen) loads when its tab is first opened, so a cold job page
 * does not fetch the charts, the photo tools, the pair builder or the report preview before it shows.
 */
const LAZY: Record<Exclude<JobSection, 'intake'>, ComponentType<SectionProps>> = {
  inspection: section(
    () => import('./sections/inspection-section'),
    (m) => m.InspectionSection,
  ),
  findings: section(
    () => import('./sections/findings-section'),
    (m) => m.FindingsSection,
  ),
  work: section(
    () => import('./sections/work-section'),
    (m) => m.WorkSection,
  ),
  media: section(
    () => import('./sections/media-section'),
    (m) => m.MediaSection,
  ),
  pairs: section(
    () => import('./sections/pairs-section'),
    (m) => m.PairsSection,
  ),
  report: section(
    () => import('./sections/report-section'),
    (m) => m.ReportSection,
  ),
  owner: section(
    () => import('./sections/owner-section'),
    (m) => m.OwnerSection,
  ),
  messages: section(
    () => import('./sections/messages-section'),
    (m) => m.MessagesSection,
  ),
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
