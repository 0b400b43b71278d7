import { ThrottlerModule } from '@nestjs/throttler';
import { Module } from '@nestjs/common';
import { AnnotationsModule } from '../annotations';
import { AuditModule } from '../audit';
import { BikesModule } from '../bikes';
import { ConsentModule } from '../consent';
import { CustomersModule } from '../customers';
import { FindingsModule } from '../findings';
import { InspectionModule } from '../inspection';
import { StorageModule } from '../infra/storage';
import { JobsModule } from '../jobs';
import { MailModule } from '../mail';
import { MediaModule } from '../media';
import { PairsModule } from '../pairs';
import { ReportsModule } from '../reports';
import { ShopsModule } from '../shops';
import { OwnerEventsBus } from './owner-events';
import { OwnerLinkGuard } from './owner-link.guard';
import { OwnerLinksController } from './owner-links.controller';
import { OwnerLinksRepository } from './owner-links.repository';
import { OwnerLinksService } from './owner-links.service';
import { OwnerMediaService } from './owner-media.service';
import { OwnerPageService } from './owner-page.service';
import { AnnotatedOwnerMedia, OutboxOwnerLinkMailer, OwnerPairsFromPairs, OwnerReportFromReports } from './owner.bindings';
import { OwnerController } from './owner.controller';
import { OWNER_LINK_MAILER, OWNER_MEDIA, OWNER_PAIRS, OWNER_REPORT } from './owner.ports';

/**
 * The owner link and the owner page. The four ports are bound to the mail
 * outbox, annotated renders, pairs and reports (adapters in owner.bindings.ts).
 */
@Module({
  // Owner routes are public: each address gets its own budget (ThrottlerGuard on the controller).
  imports: [
    ThrottlerModule.forRoot([{ ttl: 60_000, limit: 120 }]),
    AuditModule,
    BikesModule,
    ConsentModule,
    CustomersModule,
    FindingsModule,
    InspectionModule,
    JobsModule,
    MediaModule,
    ShopsModule,
    AnnotationsModule,
    MailModule,
    PairsModule,
    ReportsModule,
    StorageModule,
  ],
  controllers: [OwnerController, OwnerLinksController],
  providers: [
    OwnerLinksRepository,
    OwnerLinksService,
    OwnerPageService,
    OwnerMediaService,
    OwnerEventsBus,
    OwnerLinkGuard,
    { provide: OWNER_MEDIA, useClass: AnnotatedOwnerMedia },
    { provide: OWNER_PAIRS, useClass: OwnerPairsFromPairs },
    { provide: OWNER_REPORT, useClass: OwnerReportFromReports },
    { provide: OWNER_LINK_MAILER, useClass: OutboxOwnerLinkMailer },
  ],
  exports: [OwnerLinksService],
})
export class OwnerModule {}
