import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { SessionUser } from '@benchproof/contracts';
import { APP_CONFIG, type AppConfig } from '../config';
import type { AuthUser, SessionClaims } from '../core/auth';
import { DomainError } from '../core/http';
import { CLOCK, type Clock } from '../infra/clock';
import { UsersService } from '../users';

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
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  async login(email: string, password: string): Promise<IssuedSession> {
    const user = await this.users.verifyCredentials(email, password);
    if (!user) throw new DomainError('INVALID_CREDENTIALS');
    const claims: SessionClaims = { sub: user.id, shop: user.shopId, role: user.role };
    const token = await this.jwt.signAsync(claims);
    const expiresAt = new Date(this.clock.now().getTime() + this.cfg.SESSION_TTL_SECONDS * 1000).toISOString();
    return { token, expiresAt, user: { id: user.id, shopId: user.shopId, email: user.email, name: user.name, role: user.role } };
  }

  describe(user: AuthUser): SessionUser {
    return { id: user.id, shopId: user.shopId, email: user.email, name: user.name, role: user.role };
  }
}
