import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { CustomersModule } from '../customers';
import { JobsModule } from '../jobs';
import { MailModule } from '../mail';
import { TextsModule } from '../texts';
import { OwnerLiveEvents } from './owner-events';
import { OutboxOwnerLinkMailer } from './owner-links.bindings';
import { OwnerLinksController } from './owner-links.controller';
import { OwnerLinksRepository } from './owner-links.repository';
import { OwnerLinksService } from './owner-links.service';
import { ReadyTextListener } from './ready-text.listener';
import { OWNER_LINK_MAILER } from './owner-links.ports';

/**
 * The staff side of owner links: create (copy or e-mail), list, revoke, watch the
 * owner's activity. The public owner page (../owner) resolves tokens through the
 * exported OwnerLinksService; what the owner does reaches staff pages as domain events (owner-events.ts).
 */
@Module({
  imports: [AuditModule, CustomersModule, JobsModule, MailModule, TextsModule],
  controllers: [OwnerLinksController],
  providers: [OwnerLinksRepository, OwnerLinksService, OwnerLiveEvents, ReadyTextListener, { provide: OWNER_LINK_MAILER, useClass: OutboxOwnerLinkMailer }],
  exports: [OwnerLinksService],
})
export class OwnerLinksModule {}
