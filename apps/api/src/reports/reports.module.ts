import { ThrottlerModule } from '@nestjs/throttler';
import { Module } from '@nestjs/common';
import { MulterModule } from '@nestjs/platform-express';
import { AuditModule } from '../audit';
import { APP_CONFIG, type AppConfig } from '../config';
import { FindingsModule } from '../findings';
import { PdfModule } from '../infra/pdf';
import { StorageModule, UPLOAD_TEMP, type UploadTemp } from '../infra/storage';
import { InspectionModule } from '../inspection';
import { JobsModule } from '../jobs';
import { MediaModule } from '../media';
import { ShopsModule } from '../shops';
import { WorkLogModule } from '../work-log';
import { BrandingController } from './branding.controller';
import { BrandingService } from './branding.service';
import { ReportRenderService } from './report-render.service';
import { ReportSnapshotService } from './report-snapshot.service';
import { ANNOTATED_IMAGE_SOURCE, NoPairsSource, PAIRS_SOURCE, PrintDerivativeSource } from './report-sources';
import { ReportsController } from './reports.controller';
import { ReportsRepository } from './reports.repository';
import { ReportsService } from './reports.service';
import { VerifyController } from './verify.controller';

/**
 * The bench report. Shots and pairs come through two small ports so the annotation
 * and pairs features can be bound later: override ANNOTATED_IMAGE_SOURCE and
 * PAIRS_SOURCE with their services (see index.ts).
 */
@Module({
  imports: [
    ThrottlerModule.forRoot([{ ttl: 60_000, limit: 30 }]),
    AuditModule,
    JobsModule,
    ShopsModule,
    FindingsModule,
    InspectionModule,
    WorkLogModule,
    MediaModule,
    StorageModule,
    PdfModule,
    MulterModule.registerAsync({
      inject: [UPLOAD_TEMP, APP_CONFIG],
      useFactory: (temp: UploadTemp, cfg: AppConfig) => temp.multerOptions(cfg.MAX_PHOTO_BYTES, 1),
    }),
  ],
  controllers: [ReportsController, VerifyController, BrandingController],
  providers: [
    ReportsRepository,
    ReportsService,
    ReportSnapshotService,
    ReportRenderService,
    BrandingService,
    { provide: ANNOTATED_IMAGE_SOURCE, useClass: PrintDerivativeSource },
    { provide: PAIRS_SOURCE, useClass: NoPairsSource },
  ],
  exports: [ReportsService],
})
export class ReportsModule {}
