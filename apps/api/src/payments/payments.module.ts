import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { JobsModule } from '../jobs';
import { MailModule } from '../mail';
import { OwnerLinksModule } from '../owner-links';
import { ShopsModule } from '../shops';
import { UsersModule } from '../users';
import { BalanceModule } from './balance.module';
import { CheckoutService } from './checkout.service';
import { OwnerPaymentController, PaymentsWebhookController } from './payments-public.controller';
import { PaymentsController } from './payments.controller';
import { PaymentsRepository } from './payments.repository';
import { PaymentsService } from './payments.service';

@Module({
  imports: [AuditModule, BalanceModule, JobsModule, MailModule, OwnerLinksModule, ShopsModule, UsersModule],
  controllers: [PaymentsController, OwnerPaymentController, PaymentsWebhookController],
  providers: [PaymentsRepository, PaymentsService, CheckoutService],
  exports: [PaymentsService, BalanceModule],
})
export class PaymentsModule {}
