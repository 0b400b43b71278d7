import { Global, Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { APP_CONFIG, type AppConfig } from '../../config';
import { CSRF, CsrfGuard, csrfFactory } from './csrf';
import { JwtAuthGuard } from './jwt-auth.guard';
import { JwtStrategy } from './jwt.strategy';
import { PolicyGuard } from './policy.guard';
import { SessionStore } from './session-store';

/** Sessions for the whole API: the global guards run in order session → policy → CSRF. */
@Global()
@Module({
  imports: [
    PassportModule,
    JwtModule.registerAsync({
      inject: [APP_CONFIG],
      useFactory: (cfg: AppConfig) => ({
        secret: cfg.jwtSecret,
        signOptions: { expiresIn: cfg.SESSION_TTL_SECONDS, algorithm: 'HS256' },
      }),
    }),
  ],
  providers: [
    JwtStrategy,
    SessionStore,
    { provide: CSRF, inject: [APP_CONFIG], useFactory: csrfFactory },
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: PolicyGuard },
    { provide: APP_GUARD, useClass: CsrfGuard },
  ],
  exports: [JwtModule, CSRF, SessionStore],
})
export class AuthCoreModule {}
