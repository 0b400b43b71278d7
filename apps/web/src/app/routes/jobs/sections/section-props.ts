import type { JobDetail, SessionUser, ShopSettingsDto } from '@benchproof/contracts';

/** What every job-page section receives (its own file, so the sections and job-sections.tsx do not import each other). */
export interface SectionProps {
  job: JobDetail;
  me: SessionUser;
  settings: ShopSettingsDto;
  /** Handed over and the caller may not correct evidence: editing controls are hidden. */
  frozen: boolean;
}
