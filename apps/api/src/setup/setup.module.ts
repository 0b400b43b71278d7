import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { AuthModule } from '../auth';
import { MailModule } from '../mail';
import { PasswordResetsModule } from '../password-resets';
import { ShopsModule } from '../shops';
import { UsersModule } from '../users';
import { SetupCode } from './setup-code';
import { SetupController } from './setup.controller';
import { SetupThrottleGuard } from './setup-throttle.guard';
import { SetupService } from './setup.service';

@Module({
  imports: [AuditModule, AuthModule, MailModule, PasswordResetsModule, ShopsModule, UsersModule],
  controllers: [SetupController],
  providers: [SetupCode, SetupService, SetupThrottleGuard],
})
export class SetupModule {}
