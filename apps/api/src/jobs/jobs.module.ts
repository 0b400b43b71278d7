import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { BikesModule } from '../bikes';
import { CustomersModule } from '../customers';
import { ShopsModule } from '../shops';
import { UsersModule } from '../users';
import { BookInService } from './book-in.service';
import { JobBalances } from './job-balances';
import { JobAccess } from './job-access.service';
import { JobsController } from './jobs.controller';
import { JobsRepository } from './jobs.repository';
import { JobsService } from './jobs.service';

@Module({
  imports: [AuditModule, BikesModule, CustomersModule, ShopsModule, UsersModule],
  controllers: [JobsController],
  providers: [JobsRepository, JobsService, JobAccess, BookInService, JobBalances],
  exports: [JobsService, JobAccess],
})
export class JobsModule {}
