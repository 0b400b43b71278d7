export { UsersModule } from './users.module';
export { UsersService } from './users.service';
export { hashPassword, verifyPassword } from './password';
export type { PasswordContext } from './password-policy';
export type { TotpState } from './users-accounts';
