import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { BikesModule } from '../bikes';
import { JobsModule } from '../jobs';
import { ShopsModule } from '../shops';
import { BikeHistoryService } from './bike-history.service';
import { BikeHistoryController, InspectionController } from './inspection.controller';
import { InspectionRepository } from './inspection.repository';
import { InspectionService } from './inspection.service';

@Module({
  imports: [AuditModule, BikesModule, JobsModule, ShopsModule],
  controllers: [InspectionController, BikeHistoryController],
  providers: [InspectionRepository, InspectionService, BikeHistoryService],
  exports: [InspectionService],
})
export class InspectionModule {}
