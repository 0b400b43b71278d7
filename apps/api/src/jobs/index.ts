export { JobsModule } from './jobs.module';
export { JobsService, type JobRef, type BookedInListener, type ReportSentCheck } from './jobs.service';
