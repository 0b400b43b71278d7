import { Module } from '@nestjs/common';
import { UsersModule } from '../users';
import { AnnotationsModule } from '../annotations';
import { AuditModule } from '../audit';
import { ConsentModule } from '../consent';
import { FindingsModule } from '../findings';
import { JobsModule } from '../jobs';
import { PairsModule } from '../pairs';
import { ShopsModule } from '../shops';
import { WorkLogModule } from '../work-log';
import { ShowcaseConsentListener } from './showcase-consent.listener';
import { ShowcaseExportTasks } from './showcase-export-tasks.service';
import { ShowcaseExportService } from './showcase-export.service';
import { ShowcaseController } from './showcase.controller';
import { ShowcaseRepository } from './showcase.repository';
import { ShowcaseService } from './showcase.service';

@Module({
  imports: [AnnotationsModule, AuditModule, ConsentModule, FindingsModule, JobsModule, PairsModule, ShopsModule, UsersModule, WorkLogModule],
  controllers: [ShowcaseController],
  providers: [ShowcaseRepository, ShowcaseService, ShowcaseExportService, ShowcaseExportTasks, ShowcaseConsentListener],
  exports: [ShowcaseService],
})
export class ShowcaseModule {}
