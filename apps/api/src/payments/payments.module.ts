import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { JobsModule } from '../jobs';
import { MailModule } from '../mail';
import { OwnerLinksModule } from '../owner-links';
import { ShopsModule } from '../shops';
import { UsersModule } from '../users';
import { BalanceService } from './balance.service';
import { CheckoutService } from './checkout.service';
import { OwnerPaymentController, PaymentsWebhookController } from './payments-public.controller';
import { PaymentsController } from './payments.controller';
import { PaymentsRepository } from './payments.repository';
import { PaymentsService } from './payments.service';

@Module({
  imports: [AuditModule, JobsModule, MailModule, OwnerLinksModule, ShopsModule, UsersModule],
  controllers: [PaymentsController, OwnerPaymentController, PaymentsWebhookController],
  providers: [PaymentsRepository, BalanceService, PaymentsService, CheckoutService],
  exports: [PaymentsService, BalanceService],
})
export class PaymentsModule {}
