import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { BikesModule } from '../bikes';
import { CustomersModule } from '../customers';
import { MailTransportModule } from '../infra/mail';
import { StorageModule } from '../infra/storage';
import { JobsModule } from '../jobs';
import { ShopsModule } from '../shops';
import { MailDelivery } from './mail-delivery';
import { MailController } from './mail.controller';
import { MailRepository } from './mail.repository';
import { MailService } from './mail.service';

@Module({
  imports: [MailTransportModule, StorageModule, AuditModule, BikesModule, CustomersModule, JobsModule, ShopsModule],
  controllers: [MailController],
  providers: [MailRepository, MailDelivery, MailService],
  exports: [MailService],
})
export class MailModule {}
