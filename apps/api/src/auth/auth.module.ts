import { Module } from '@nestjs/common';
import { UsersModule } from '../users';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { LoginThrottle } from './login-throttle';

@Module({
  imports: [UsersModule],
  controllers: [AuthController],
  providers: [AuthService, LoginThrottle],
})
export class AuthModule {}
