import { sharedThrottlerModule } from '../infra/redis';
import { Module } from '@nestjs/common';
import { MulterModule } from '@nestjs/platform-express';
import { AnnotationsModule } from '../annotations';
import { AuditModule } from '../audit';
import { APP_CONFIG, type AppConfig } from '../config';
import { FindingsModule } from '../findings';
import { PdfModule } from '../infra/pdf';
import { StorageModule, UPLOAD_TEMP, type UploadTemp } from '../infra/storage';
import { InspectionModule } from '../inspection';
import { JobsModule } from '../jobs';
import { MailModule } from '../mail';
import { MediaModule } from '../media';
import { OwnerLinksModule } from '../owner-links';
import { PairsModule } from '../pairs';
import { ShopsModule } from '../shops';
import { WorkLogModule } from '../work-log';
import { BrandingController } from './branding.controller';
import { BrandingService } from './branding.service';
import { ReportRenderService } from './report-render.service';
import { ReportSnapshotService } from './report-snapshot.service';
import { ANNOTATED_IMAGE_SOURCE, AnnotatedPrintSource, PAIRS_SOURCE, PairsFromPairsService } from './report-sources';
import { ReportsController } from './reports.controller';
import { ReportsRepository } from './reports.repository';
import { ReportsService } from './reports.service';
import { VerifyController } from './verify.controller';

/**
 * The bench report. Shots come from the annotated print renders and pairs from the
 * pairs feature, each through a small port (report-sources.ts); an issued PDF goes to
 * the owner through MailService.sendReport, attached by storage key and SHA-256, with a fresh owner
 * link (OwnerLinksService.sendWithLink) in the same e-mail.
 */
@Module({
  imports: [
    sharedThrottlerModule([{ ttl: 60_000, limit: 30 }]),
    AuditModule,
    JobsModule,
    ShopsModule,
    FindingsModule,
    InspectionModule,
    WorkLogModule,
    MediaModule,
    AnnotationsModule,
    PairsModule,
    MailModule,
    OwnerLinksModule,
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
    { provide: ANNOTATED_IMAGE_SOURCE, useClass: AnnotatedPrintSource },
    { provide: PAIRS_SOURCE, useClass: PairsFromPairsService },
  ],
  exports: [ReportsService],
})
export class ReportsModule {}
