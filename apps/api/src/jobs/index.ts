export { JobsModule } from './jobs.module';
export { JobsService, type JobRef, type BookedInListener } from './jobs.service';
