export { JobsModule } from './jobs.module';
export { JobsService } from './jobs.service';
export { JobAccess, type JobRef, type JobCaller, type ShopScope, type EvidenceKind } from './job-access.service';
export { JOB_BALANCES, type JobBalancePort } from './job-balances';
