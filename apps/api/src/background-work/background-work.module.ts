import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { BackgroundWorkController } from './background-work.controller';
import { WorkJobsRepository } from './work-jobs.repository';

/** Failed background tasks of a shop for the manager, with retry (the tasks themselves belong to their features). */
@Module({ imports: [AuditModule], controllers: [BackgroundWorkController], providers: [WorkJobsRepository] })
export class BackgroundWorkModule {}
