import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { BikesModule } from '../bikes';
import { CustomersModule } from '../customers';
import { ShopsModule } from '../shops';
import { UsersModule } from '../users';
import { JobAccess } from './job-access.service';
import { JobsController } from './jobs.controller';
import { JobsRepository } from './jobs.repository';
import { JobsService } from './jobs.service';

@Module({
  imports: [AuditModule, BikesModule, CustomersModule, ShopsModule, UsersModule],
  controllers: [JobsController],
  providers: [JobsRepository, JobsService, JobAccess],
  exports: [JobsService, JobAccess],
})
export class JobsModule {}
