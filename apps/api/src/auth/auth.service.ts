import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { SessionUser } from '@benchproof/contracts';
import { APP_CONFIG, type AppConfig } from '../config';
import { SessionStore, type AuthUser, type SessionClaims } from '../core/auth';
import { DomainError } from '../core/http';
import { UsersService } from '../users';
import { LoginThrottle } from './login-throttle';

export interface IssuedSession {
  token: string;
  user: SessionUser;
  expiresAt: string;
}

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly jwt: JwtService,
    private readonly sessions: SessionStore,
    private readonly throttle: LoginThrottle,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  /** Checks the throttle first, counts only failures, then opens a server-side session. */
  async login(email: string, password: string, address: string): Promise<IssuedSession> {
    const account = email.trim().toLowerCase();
    await this.throttle.assertAllowed(account, address);
    const user = await this.users.verifyCredentials(account, password);
    if (!user) {
      await this.throttle.failed(account, address);
      throw new DomainError('INVALID_CREDENTIALS');
    }
    await this.throttle.succeeded(account);
    return this.issue(user);
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

  private async issue(user: AuthUser): Promise<IssuedSession> {
    const { sid, expiresAt } = this.sessions.open(user, this.cfg.SESSION_TTL_SECONDS);
    const claims: SessionClaims = { sub: user.id, shop: user.shopId, role: user.role, sid };
    const token = await this.jwt.signAsync(claims);
    return { token, expiresAt: expiresAt.toISOString(), user: this.describe(user) };
  }
}
