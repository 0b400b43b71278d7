import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { ShopsController } from './shops.controller';
import { ShopsRepository } from './shops.repository';
import { ShopsService } from './shops.service';

@Module({
  imports: [AuditModule],
  controllers: [ShopsController],
  providers: [ShopsRepository, ShopsService],
  exports: [ShopsService],
})
export class ShopsModule {}
