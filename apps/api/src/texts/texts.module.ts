import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { CustomersModule } from '../customers';
import { JobsModule } from '../jobs';
import { ShopsModule } from '../shops';
import { TextDelivery } from './text-delivery';
import { TextsWebhooksController } from './texts-webhooks.controller';
import { TextsWebhooks } from './texts-webhooks.service';
import { TextsController } from './texts.controller';
import { TextsRepository } from './texts.repository';
import { TextsService } from './texts.service';

/** Texts to owners who prefer them: the outbox rows, their 'text.send' task, the provider's callbacks and STOP replies. */
@Module({
  imports: [AuditModule, CustomersModule, JobsModule, ShopsModule],
  controllers: [TextsController, TextsWebhooksController],
  providers: [TextsRepository, TextsService, TextDelivery, TextsWebhooks],
  exports: [TextsService],
})
export class TextsModule {}
