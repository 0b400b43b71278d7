import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { createHmac } from 'node:crypto';
import { APP_CONFIG, type AppConfig } from '../config';
import { DomainError } from '../core/http';

/** What is still missing after the password: a code from the app, or setting the app up (shop requires it). */
export type ChallengeStep = 'code' | 'enrol';

interface ChallengeClaims {
  sub: number;
  shop: number;
  step: ChallengeStep;
}

/** Five minutes to type the code. */
const CHALLENGE_SECONDS = 5 * 60;

/**
 * The proof that a password was right, carried to the second step. It is signed with its own key
 * (derived from the session secret for this purpose only), so it can never pass as a session token,
 * and it opens nothing but the second-step routes: no session row exists until the code is checked.
 */
@Injectable()
export class SignInChallenge {
  private readonly key: Buffer;

  constructor(
    private readonly jwt: JwtService,
    @Inject(APP_CONFIG) cfg: AppConfig,
  ) {
    this.key = createHmac('sha256', cfg.jwtSecret).update('benchproof:sign-in-challenge:v1').digest();
  }

  issue(user: { id: number; shopId: number }, step: ChallengeStep): Promise<string> {
    const claims: ChallengeClaims = { sub: user.id, shop: user.shopId, step };
    return this.jwt.signAsync(claims, { secret: this.key, expiresIn: CHALLENGE_SECONDS, algorithm: 'HS256' });
  }

  /** The user behind a challenge for this step, or 401 (an old, altered or wrong-step challenge means: sign in again). */
  async read(token: string, step: ChallengeStep): Promise<{ userId: number; shopId: number }> {
    const claims = await this.jwt.verifyAsync<ChallengeClaims>(token, { secret: this.key, algorithms: ['HS256'] }).catch(() => null);
    if (!claims || claims.step !== step || typeof claims.sub !== 'number')
      throw new DomainError('SESSION_EXPIRED', 'Sign in again: the sign-in took too long.');
    return { userId: claims.sub, shopId: claims.shop };
  }
}
