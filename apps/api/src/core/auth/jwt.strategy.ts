import { Inject, Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { eq } from 'drizzle-orm';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { APP_CONFIG, type AppConfig } from '../../config';
import { users } from '../../db/schema';
import { DB, type Db } from '../db';
import type { AuthUser, SessionClaims } from './auth-user';
import { sessionFromCookie } from './session-cookie';

/**
 * Reads the JWT from the httpOnly session cookie (browsers, including `<img>` and
 * `<video>` requests) or from a Bearer header (scripts). A deactivated user loses
 * access at the next request, not when the token expires.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(APP_CONFIG) cfg: AppConfig,
    @Inject(DB) private readonly db: Db,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromExtractors([sessionFromCookie, ExtractJwt.fromAuthHeaderAsBearerToken()]),
      secretOrKey: cfg.jwtSecret,
      algorithms: ['HS256'],
    });
  }

  validate(claims: SessionClaims): AuthUser | false {
    const user = this.db.select().from(users).where(eq(users.id, claims.sub)).get();
    if (!user?.active || user.shopId !== claims.shop) return false;
    return { id: user.id, shopId: user.shopId, role: user.role, email: user.email, name: user.name };
  }
}
