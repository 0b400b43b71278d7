import { ThrottlerModule } from '@nestjs/throttler';
import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { BikesModule } from '../bikes';
import { ConsentModule } from '../consent';
import { CustomersModule } from '../customers';
import { FindingsModule } from '../findings';
import { InspectionModule } from '../inspection';
import { JobsModule } from '../jobs';
import { MediaModule } from '../media';
import { ShopsModule } from '../shops';
import { OwnerEventsBus } from './owner-events';
import { OwnerLinkGuard } from './owner-link.guard';
import { OwnerLinksController } from './owner-links.controller';
import { OwnerLinksRepository } from './owner-links.repository';
import { OwnerLinksService } from './owner-links.service';
import { OwnerMediaService } from './owner-media.service';
import { OwnerPageService } from './owner-page.service';
import { OwnerController } from './owner.controller';
import { DerivativeOwnerMedia, noMail, noPairs, noReport } from './owner.defaults';
import { OWNER_LINK_MAILER, OWNER_MEDIA, OWNER_PAIRS, OWNER_REPORT } from './owner.ports';

/**
 * The owner link and the owner page. The four ports are bound here to
 * defaults that work today; re-bind them to the mail outbox, annotated
 * renders, pairs and reports services when those features are merged.
 */
@Module({
  // Owner routes are public: each address gets its own budget (ThrottlerGuard on the controller).
  imports: [ThrottlerModule.forRoot([{ ttl: 60_000, limit: 120 }]), AuditModule, BikesModule, ConsentModule, CustomersModule, FindingsModule, InspectionModule, JobsModule, MediaModule, ShopsModule],
  controllers: [OwnerController, OwnerLinksController],
  providers: [
    OwnerLinksRepository,
    OwnerLinksService,
    OwnerPageService,
    OwnerMediaService,
    OwnerEventsBus,
    OwnerLinkGuard,
    { provide: OWNER_MEDIA, useClass: DerivativeOwnerMedia },
    { provide: OWNER_PAIRS, useValue: noPairs },
    { provide: OWNER_REPORT, useValue: noReport },
    { provide: OWNER_LINK_MAILER, useValue: noMail },
  ],
  exports: [OwnerLinksService],
})
export class OwnerModule {}
