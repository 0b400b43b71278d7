export { UsersModule } from './users.module';
export { UsersService } from './users.service';
export type { UserRow } from './users.repository';
export { hashPassword, verifyPassword } from './password';
