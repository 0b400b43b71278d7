export { JobsModule } from './jobs.module';
export { JobsService, type BookedInListener } from './jobs.service';
export { JobAccess, type JobRef, type JobCaller, type EvidenceKind } from './job-access.service';
