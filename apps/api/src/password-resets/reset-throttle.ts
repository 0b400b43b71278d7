import { Inject, Injectable } from '@nestjs/common';
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { APP_CONFIG, type AppConfig } from '../config';
import { DomainError } from '../core/http';

/**
 * Requests for reset links are counted per typed address (whether or not it has an account, so the
 * limit reveals nothing) and per client address, within RESET_THROTTLE_WINDOW_SECONDS. Over either
 * limit: 429 RATE_LIMITED with Retry-After, and no mail.
 */
@Injectable()
export class ResetThrottle {
  private readonly byAccount: RateLimiterMemory;
  private readonly byAddress: RateLimiterMemory;

  constructor(@Inject(APP_CONFIG) cfg: AppConfig) {
    const duration = cfg.RESET_THROTTLE_WINDOW_SECONDS;
    this.byAccount = new RateLimiterMemory({ keyPrefix: 'reset-account', points: cfg.RESET_THROTTLE_LIMIT, duration });
    this.byAddress = new RateLimiterMemory({ keyPrefix: 'reset-address', points: cfg.RESET_THROTTLE_ADDRESS_LIMIT, duration });
  }

  async take(account: string, address: string): Promise<void> {
    try {
      await this.byAddress.consume(address);
      await this.byAccount.consume(account);
    } catch (e) {
      if (!(e instanceof RateLimiterRes)) throw e;
      throw new DomainError('RATE_LIMITED', undefined, { retryAfterSeconds: Math.max(1, Math.ceil(e.msBeforeNext / 1000)) });
    }
  }
}
