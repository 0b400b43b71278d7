import { Inject, Injectable } from '@nestjs/common';
import type { SignInStep } from '@benchproof/contracts';
import type { DoubleCsrfUtilities } from 'csrf-csrf';
import type { Request, Response } from 'express';
import { APP_CONFIG, type AppConfig } from '../config';
import { CSRF, issueCsrfToken, SESSION_COOKIE, sessionCookieOptions } from '../core/auth';
import type { IssuedSession, SignInOutcome } from './auth.service';

/** Turns a sign-in outcome into the answer: the session cookie and a CSRF token, or the next step's challenge. */
@Injectable()
export class SessionResponder {
  constructor(
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CSRF) private readonly csrf: DoubleCsrfUtilities,
  ) {}

  outcome(outcome: SignInOutcome, req: Request, res: Response): SignInStep {
    if (outcome.step !== 'done') return outcome;
    return this.session(outcome.session, req, res);
  }

  session(session: IssuedSession, req: Request, res: Response) {
    res.cookie(SESSION_COOKIE, session.token, sessionCookieOptions(this.cfg.COOKIE_SECURE, this.cfg.SESSION_TTL_SECONDS * 1000));
    const csrfToken = issueCsrfToken(this.csrf, req, res, session.token);
    return { step: 'done' as const, user: session.user, expiresAt: session.expiresAt, csrfToken };
  }
}

/** The caller's address for throttles: req.ip follows X-Forwarded-For only when TRUST_PROXY configures Express's 'trust proxy'. */
export const clientAddress = (req: Request): string => req.ip ?? req.socket.remoteAddress ?? 'unknown';
