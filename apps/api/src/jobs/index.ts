export { JobsModule } from './jobs.module';
export { JobsService, type JobRef } from './jobs.service';
