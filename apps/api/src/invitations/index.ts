export { InvitationsModule } from './invitations.module';
