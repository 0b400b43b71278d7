import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { ShopsModule } from '../shops';
import { UsersModule } from '../users';
import { RecoveryCodesRepository } from './recovery-codes.repository';
import { TwoFactorController } from './two-factor.controller';
import { TwoFactorService } from './two-factor.service';

@Module({
  imports: [AuditModule, UsersModule, ShopsModule],
  controllers: [TwoFactorController],
  providers: [RecoveryCodesRepository, TwoFactorService],
  exports: [TwoFactorService],
})
export class TwoFactorModule {}
