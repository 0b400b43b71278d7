import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { RecoveryCodes, SessionUser, TotpEnrolment } from '@benchproof/contracts';
import { APP_CONFIG, type AppConfig } from '../config';
import { SessionStore, type AuthUser, type SessionClaims } from '../core/auth';
import { DomainError } from '../core/http';
import { TwoFactorService } from '../two-factor';
import { UsersService } from '../users';
import { LoginThrottle } from './login-throttle';
import { SignInChallenge } from './sign-in-challenge';

export interface IssuedSession {
  token: string;
  user: SessionUser;
  expiresAt: string;
}

/** Where a sign-in stands after a step: signed in, or a challenge for the second factor. */
export type SignInOutcome = { step: 'done'; session: IssuedSession } | { step: 'code' | 'enrol'; challenge: string };

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly jwt: JwtService,
    private readonly sessions: SessionStore,
    private readonly throttle: LoginThrottle,
    private readonly twoFactor: TwoFactorService,
    private readonly challenges: SignInChallenge,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  /** Checks the throttle first, counts only failures, then goes on to the second factor or a session. */
  async login(email: string, password: string, address: string): Promise<SignInOutcome> {
    const account = email.trim().toLowerCase();
    await this.throttle.assertAllowed(account, address);
    const user = await this.users.verifyCredentials(account, password);
    if (!user) {
      await this.throttle.failed(account, address);
      throw new DomainError('INVALID_CREDENTIALS');
    }
    await this.throttle.succeeded(account);
    return this.afterPassword(user);
  }

  /**
   * The one place a proven password becomes a session. Sign-in, an accepted invitation and a
   * confirmed sign-up all come through here, so a second factor cannot be skipped by any of them.
   */
  async afterPassword(user: AuthUser): Promise<SignInOutcome> {
    const need = this.twoFactor.need(user);
    if (need.enabled) return { step: 'code', challenge: await this.challenges.issue(user, 'code') };
    if (need.required) return { step: 'enrol', challenge: await this.challenges.issue(user, 'enrol') };
    return { step: 'done', session: await this.issue(user) };
  }

  /** The second step: a code from the app or a recovery code, throttled like passwords. */
  async withCode(challenge: string, code: string, address: string): Promise<IssuedSession> {
    const user = await this.challengeUser(challenge, 'code');
    const key = `second-factor:${user.id}`;
    await this.throttle.assertAllowed(key, address);
    if (!this.twoFactor.check(user, code)) {
      await this.throttle.failed(key, address);
      throw new DomainError('CODE_INVALID', undefined, { field: 'code' });
    }
    await this.throttle.succeeded(key);
    return this.issue(user);
  }

  /** The shop requires a second factor this user has not set up: the secret and QR code, before any session. */
  async enrolStart(challenge: string): Promise<TotpEnrolment> {
    return this.twoFactor.start(await this.challengeUser(challenge, 'enrol'));
  }

  async enrolConfirm(challenge: string, code: string, address: string): Promise<{ session: IssuedSession } & RecoveryCodes> {
    const user = await this.challengeUser(challenge, 'enrol');
    const key = `second-factor:${user.id}`;
    await this.throttle.assertAllowed(key, address);
    let codes: RecoveryCodes;
    try {
      codes = this.twoFactor.confirm(user, code);
    } catch (e) {
      await this.throttle.failed(key, address);
      throw e;
    }
    return { session: await this.issue(user), ...codes };
  }

  /** Ends the session the token names, if it is genuine; an unreadable token has nothing to end. */
  async logout(token: string | null): Promise<void> {
    if (!token) return;
    const claims = await this.jwt.verifyAsync<SessionClaims>(token, { ignoreExpiration: true }).catch(() => null);
    if (typeof claims?.sid === 'string') this.sessions.end(claims.sid);
  }

  /** A new password ends every session of the user; this device gets a fresh one. */
  async changePassword(actor: AuthUser, currentPassword: string, newPassword: string): Promise<IssuedSession> {
    await this.users.changePassword(actor, currentPassword, newPassword);
    return this.issue(actor);
  }

  describe(user: AuthUser): SessionUser {
    return { id: user.id, shopId: user.shopId, email: user.email, name: user.name, role: user.role };
  }

  private async challengeUser(challenge: string, step: 'code' | 'enrol'): Promise<AuthUser> {
    const { userId, shopId } = await this.challenges.read(challenge, step);
    const user = this.users.activeIdentity(shopId, userId);
    if (!user) throw new DomainError('SESSION_EXPIRED', 'Sign in again.');
    return user;
  }

  private async issue(user: AuthUser): Promise<IssuedSession> {
    const { sid, expiresAt } = this.sessions.open(user, this.cfg.SESSION_TTL_SECONDS);
    const claims: SessionClaims = { sub: user.id, shop: user.shopId, role: user.role, sid };
    const token = await this.jwt.signAsync(claims);
    return { token, expiresAt: expiresAt.toISOString(), user: this.describe(user) };
  }
}
