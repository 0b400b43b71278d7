import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { AuthModule } from '../auth';
import { MailModule } from '../mail';
import { ShopsModule } from '../shops';
import { UsersModule } from '../users';
import { AccountLinks } from './account-links.service';
import { AccountTokensRepository } from './account-tokens.repository';
import { PasswordResetsController } from './password-resets.controller';
import { PasswordResetsService } from './password-resets.service';
import { ResetThrottle } from './reset-throttle';

@Module({
  imports: [AuditModule, AuthModule, MailModule, ShopsModule, UsersModule],
  controllers: [PasswordResetsController],
  providers: [AccountTokensRepository, AccountLinks, PasswordResetsService, ResetThrottle],
  exports: [AccountLinks],
})
export class PasswordResetsModule {}
