import { sharedThrottlerModule } from '../infra/redis';
import { type MiddlewareConsumer, Module, type NestModule } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import { AnnotationsModule } from '../annotations';
import { BikesModule } from '../bikes';
import { ConsentModule } from '../consent';
import { CustomersModule } from '../customers';
import { FindingsModule } from '../findings';
import { InspectionModule } from '../inspection';
import { StorageModule } from '../infra/storage';
import { JobsModule } from '../jobs';
import { MediaModule } from '../media';
import { OwnerLinksModule } from '../owner-links';
import { PairsModule } from '../pairs';
import { ReportsModule } from '../reports';
import { ShopsModule } from '../shops';
import { OwnerLinkGuard } from './owner-link.guard';
import { OwnerMediaService } from './owner-media.service';
import { OwnerPageService } from './owner-page.service';
import { AnnotatedOwnerMedia, OwnerPairsFromPairs, OwnerReportFromReports } from './owner.bindings';
import { OwnerController } from './owner.controller';
import { OWNER_MEDIA, OWNER_PAIRS, OWNER_REPORT } from './owner.ports';

/**
 * Owner answers hold the owner's name and prices: no shared cache and no browser
 * history may keep them. Set before the guards run, so errors carry it too; file
 * answers replace it with `private, no-cache`.
 */
function noStore(_req: Request, res: Response, next: NextFunction): void {
  res.setHeader('Cache-Control', 'no-store');
  next();
}

/**
 * The public owner page (the staff side of links is ../owner-links). The three
 * ports are bound to annotated renders, pairs and reports (owner.bindings.ts).
 */
@Module({
  // Owner routes are public: each address gets its own budget (ThrottlerGuard via @OwnerRoute).
  imports: [
    sharedThrottlerModule([{ ttl: 60_000, limit: 120 }]),
    BikesModule,
    ConsentModule,
    CustomersModule,
    FindingsModule,
    InspectionModule,
    JobsModule,
    MediaModule,
    OwnerLinksModule,
    ShopsModule,
    AnnotationsModule,
    PairsModule,
    ReportsModule,
    StorageModule,
  ],
  controllers: [OwnerController],
  providers: [
    OwnerPageService,
    OwnerMediaService,
    OwnerLinkGuard,
    { provide: OWNER_MEDIA, useClass: AnnotatedOwnerMedia },
    { provide: OWNER_PAIRS, useClass: OwnerPairsFromPairs },
    { provide: OWNER_REPORT, useClass: OwnerReportFromReports },
  ],
})
export class OwnerModule implements NestModule {
  configure(consumer: MiddlewareConsumer): void {
    consumer.apply(noStore).forRoutes(OwnerController);
  }
}
