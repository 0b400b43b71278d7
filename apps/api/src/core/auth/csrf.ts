import { type CanActivate, type ExecutionContext, Inject, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { doubleCsrf, type DoubleCsrfUtilities } from 'csrf-csrf';
import type { Request, Response } from 'express';
import type { AppConfig } from '../../config';
import { DomainError } from '../http';
import { IS_PUBLIC } from './auth.decorators';
import { CSRF_COOKIE, CSRF_HEADER, SESSION_COOKIE, sessionFromCookie } from './session-cookie';

export const CSRF = Symbol('CSRF');

/** Double-submit CSRF tokens bound to the session cookie (csrf-csrf). */
export const csrfFactory = (cfg: AppConfig): DoubleCsrfUtilities =>
  doubleCsrf({
    getSecret: () => cfg.jwtSecret,
    getSessionIdentifier: (req) => sessionFromCookie(req) ?? '',
    cookieName: CSRF_COOKIE,
    cookieOptions: { sameSite: 'lax', secure: cfg.COOKIE_SECURE, path: '/', httpOnly: true },
    getCsrfTokenFromRequest: (req) => req.headers[CSRF_HEADER],
  });

/**
 * Requests authenticated by the session cookie must echo the CSRF token on every
 * state-changing call. Bearer-token callers carry no ambient credential and are exempt.
 */
@Injectable()
export class CsrfGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    @Inject(CSRF) private readonly csrf: DoubleCsrfUtilities,
  ) {}

  canActivate(ctx: ExecutionContext): boolean {
    const req = ctx.switchToHttp().getRequest<Request>();
    if (['GET', 'HEAD', 'OPTIONS'].includes(req.method)) return true;
    if (!sessionFromCookie(req)) return true;
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [ctx.getHandler(), ctx.getClass()])) return true;
    if (this.csrf.validateRequest(req)) return true;
    throw new DomainError('CSRF_MISMATCH');
  }
}

/**
 * Issues a CSRF token for the session cookie about to be set (or already present). A new session always
 * gets a new token; otherwise the token already in the cookie is kept when its HMAC still matches this
 * session (csrf-csrf checks that), which spares the random bytes on every page load's session check, and then
 * no Set-Cookie is sent for it.
 */
export function issueCsrfToken(csrf: DoubleCsrfUtilities, req: Request, res: Response, session?: string): string {
  const cookies = req.cookies as Record<string, string | undefined>;
  if (session) cookies[SESSION_COOKIE] = session;
  // csrf-csrf sets its cookie on every call; the browser already holds an unchanged token, so only a new one is sent.
  const prior = cookies[CSRF_COOKIE];
  const onlyWhenChanged = {
    cookie: (name: string, value: string, options: object) => (value === prior ? onlyWhenChanged : res.cookie(name, value, options)),
  };
  return csrf.generateCsrfToken(req, onlyWhenChanged as unknown as Response, { overwrite: session !== undefined });
}
