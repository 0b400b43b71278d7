export { UsersModule } from './users.module';
export { UsersService } from './users.service';
export { hashPassword, verifyPassword } from './password';
