import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { BikesModule } from '../bikes';
import { InspectionModule } from '../inspection';
import { JobsModule } from '../jobs';
import { ShopsModule } from '../shops';
import { FindingsController } from './findings.controller';
import { FindingsRepository } from './findings.repository';
import { FindingsService } from './findings.service';

@Module({
  imports: [AuditModule, BikesModule, InspectionModule, JobsModule, ShopsModule],
  controllers: [FindingsController],
  providers: [FindingsRepository, FindingsService],
  exports: [FindingsService],
})
export class FindingsModule {}
