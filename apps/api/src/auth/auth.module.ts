import { Module } from '@nestjs/common';
import { TwoFactorModule } from '../two-factor';
import { UsersModule } from '../users';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { LoginThrottle } from './login-throttle';
import { SessionResponder } from './session-responder';
import { SignInChallenge } from './sign-in-challenge';

@Module({
  imports: [UsersModule, TwoFactorModule],
  controllers: [AuthController],
  providers: [AuthService, LoginThrottle, SignInChallenge, SessionResponder],
  exports: [AuthService, SessionResponder, LoginThrottle],
})
export class AuthModule {}
