import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { JobsModule } from '../jobs';
import { ShopsModule } from '../shops';
import { UsersModule } from '../users';
import { WorkLogController } from './work-log.controller';
import { WorkLogRepository } from './work-log.repository';
import { WorkLogService } from './work-log.service';

@Module({
  imports: [AuditModule, JobsModule, ShopsModule, UsersModule],
  controllers: [WorkLogController],
  providers: [WorkLogRepository, WorkLogService],
  exports: [WorkLogService],
})
export class WorkLogModule {}
