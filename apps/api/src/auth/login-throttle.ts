import { Inject, Injectable } from '@nestjs/common';
import type { RateLimiterAbstract, RateLimiterRes } from 'rate-limiter-flexible';
import { APP_CONFIG, type AppConfig } from '../config';
import { DomainError } from '../core/http';
import { createRateLimiter, type MaybeRedis, REDIS } from '../infra/redis';

/**
 * Failed sign-ins are counted per account and per address (rate-limiter-flexible,
 * fixed window). Successful sign-ins are not counted, so a shop's shared front-desk
 * machine is not locked by its own staff; a success clears its account's count.
 * The address is Express's req.ip, which follows X-Forwarded-For only when TRUST_PROXY is set.
 * With REDIS_URL the counts live in Redis, shared by every API process.
 */
@Injectable()
export class LoginThrottle {
  private readonly byAccount: RateLimiterAbstract;
  private readonly byAddress: RateLimiterAbstract;

  constructor(@Inject(APP_CONFIG) cfg: AppConfig, @Inject(REDIS) redis: MaybeRedis) {
    const duration = cfg.LOGIN_THROTTLE_WINDOW_SECONDS;
    this.byAccount = createRateLimiter(redis, { keyPrefix: 'login-account', points: cfg.LOGIN_THROTTLE_LIMIT, duration });
    this.byAddress = createRateLimiter(redis, { keyPrefix: 'login-address', points: cfg.LOGIN_THROTTLE_ADDRESS_LIMIT, duration });
  }

  /** Refuses with 429 + Retry-After while either count is used up. */
  async assertAllowed(email: string, address: string): Promise<void> {
    const [account, addr] = await Promise.all([this.byAccount.get(email), this.byAddress.get(address)]);
    const waits = [usedUp(account, this.byAccount.points), usedUp(addr, this.byAddress.points)].filter((ms): ms is number => ms !== null);
    if (waits.length) throw new DomainError('RATE_LIMITED', undefined, { retryAfterSeconds: Math.max(1, Math.ceil(Math.max(...waits) / 1000)) });
  }

  async failed(email: string, address: string): Promise<void> {
    await Promise.all([this.byAccount.penalty(email), this.byAddress.penalty(address)]);
  }

  async succeeded(email: string): Promise<void> {
    await this.byAccount.delete(email);
  }
}

const usedUp = (res: RateLimiterRes | null, points: number): number | null => (res && res.consumedPoints >= points ? res.msBeforeNext : null);
