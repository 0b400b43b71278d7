import { Inject, Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { createSecretKey, type KeyObject } from 'node:crypto';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { APP_CONFIG, type AppConfig } from '../../config';
import type { AuthUser, SessionClaims } from './auth-user';
import { sessionFromCookie } from './session-cookie';
import { SessionStore } from './session-store';

/** The signing secret as a ready key object, so verifying a token does not re-import a string each request. */
export const sessionKey = (cfg: AppConfig): KeyObject => createSecretKey(Buffer.from(cfg.jwtSecret, 'utf8'));

/** Where a session token may come from: the httpOnly cookie (browsers) or a Bearer header (scripts). */
export const sessionTokenFrom = ExtractJwt.fromExtractors([sessionFromCookie, ExtractJwt.fromAuthHeaderAsBearerToken()]);

/**
 * Reads the JWT from the httpOnly session cookie (browsers, including `<img>` and
 * `<video>` requests) or from a Bearer header (scripts). The token must carry an
 * expiry and name a live server-side session: sign-out, deactivation and a password
 * change end it at the next request, not when the token expires.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(APP_CONFIG) cfg: AppConfig,
    private readonly sessions: SessionStore,
  ) {
    super({
      jwtFromRequest: sessionTokenFrom,
      // passport-jwt hands this to jsonwebtoken, which accepts a KeyObject; its typings only list string | Buffer.
      secretOrKey: sessionKey(cfg) as unknown as string,
      algorithms: ['HS256'],
    });
  }

  validate(claims: SessionClaims & { exp?: unknown }): AuthUser | false {
    if (typeof claims.exp !== 'number' || typeof claims.sid !== 'string') return false;
    return this.sessions.resolve(claims.sid, claims.sub, claims.shop) ?? false;
  }
}
