import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { BikesModule } from '../bikes';
import { CustomersModule } from '../customers';
import { ImportsController } from './imports.controller';
import { ImportsService } from './imports.service';

@Module({
  imports: [AuditModule, CustomersModule, BikesModule],
  controllers: [ImportsController],
  providers: [ImportsService],
})
export class ImportsModule {}
