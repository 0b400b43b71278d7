import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { ConsentModule } from '../consent';
import { CustomerErasureService } from './customer-erasure.service';
import { DataExportController } from './data-export.controller';
import { DataExportService } from './data-export.service';

@Module({
  imports: [AuditModule, ConsentModule],
  controllers: [DataExportController],
  providers: [DataExportService, CustomerErasureService],
})
export class DataExportModule {}
