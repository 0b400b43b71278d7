export { PasswordResetsModule } from './password-resets.module';
export { AccountLinks, type LinkOwner } from './account-links.service';
