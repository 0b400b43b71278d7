export { JobsModule } from './jobs.module';
export { JobsService, type JobRef, type BookedInListener } from './jobs.service';
export type { ReportSentCheck } from './report-sent';
