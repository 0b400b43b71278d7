import { type CanActivate, type ExecutionContext, Inject, Injectable } from '@nestjs/common';
import type { Request } from 'express';
import { type RateLimiterAbstract, RateLimiterRes } from 'rate-limiter-flexible';
import { clientAddress } from '../auth';
import { APP_CONFIG, type AppConfig } from '../config';
import { DomainError } from '../core/http';
import { createRateLimiter, type MaybeRedis, REDIS } from '../infra/redis';

/** Setup attempts (guessing the code) and sign-ups per client address: SIGNUP_LIMIT an hour. */
@Injectable()
export class SetupThrottleGuard implements CanActivate {
  private readonly limiter: RateLimiterAbstract;

  constructor(@Inject(APP_CONFIG) cfg: AppConfig, @Inject(REDIS) redis: MaybeRedis) {
    this.limiter = createRateLimiter(redis, { keyPrefix: 'setup', points: cfg.SIGNUP_LIMIT, duration: 3600 });
  }

  async canActivate(ctx: ExecutionContext): Promise<boolean> {
    const req = ctx.switchToHttp().getRequest<Request>();
    try {
      await this.limiter.consume(`${req.path}:${clientAddress(req)}`);
      return true;
    } catch (e) {
      if (!(e instanceof RateLimiterRes)) throw e;
      throw new DomainError('RATE_LIMITED', undefined, { retryAfterSeconds: Math.max(1, Math.ceil(e.msBeforeNext / 1000)) });
    }
  }
}
