import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { AuthModule } from '../auth';
import { MailModule } from '../mail';
import { ShopsModule } from '../shops';
import { UsersModule } from '../users';
import { InvitationsController } from './invitations.controller';
import { InvitationsRepository } from './invitations.repository';
import { InvitationsService } from './invitations.service';

@Module({
  imports: [AuditModule, AuthModule, MailModule, ShopsModule, UsersModule],
  controllers: [InvitationsController],
  providers: [InvitationsRepository, InvitationsService],
})
export class InvitationsModule {}
