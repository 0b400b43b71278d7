import { Body, Controller, Get, HttpCode, Inject, Post, Req, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ChangePasswordRequestSchema, LoginRequestSchema, type ChangePasswordRequest, type LoginRequest } from '@benchproof/contracts';
import type { DoubleCsrfUtilities } from 'csrf-csrf';
import type { Request, Response } from 'express';
import { APP_CONFIG, type AppConfig } from '../config';
import {
  Can,
  CSRF,
  CSRF_COOKIE,
  CurrentUser,
  issueCsrfToken,
  Public,
  SESSION_COOKIE,
  sessionCookieOptions,
  sessionTokenFrom,
  type AuthUser,
} from '../core/auth';
import { ApiZodBody, zod } from '../core/http';
import { AuthService, type IssuedSession } from './auth.service';

/**
 * Sessions live in an httpOnly cookie so `<img>` and `<video>` tags load protected
 * media without tokens in URLs; every state-changing call echoes a CSRF token.
 */
@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CSRF) private readonly csrf: DoubleCsrfUtilities,
  ) {}

  @Post('login')
  @Public()
  @HttpCode(200)
  @ApiZodBody(LoginRequestSchema)
  async login(@Body(zod(LoginRequestSchema)) body: LoginRequest, @Req() req: Request, @Res({ passthrough: true }) res: Response) {
    // req.ip follows X-Forwarded-For only when TRUST_PROXY configures Express's 'trust proxy'.
    const session = await this.auth.login(body.email, body.password, req.ip ?? req.socket.remoteAddress ?? 'unknown');
    return this.startSession(session, req, res);
  }

  /** Changes the caller's password, ends all their sessions and starts a new one on this device. */
  @Post('password')
  @Can('account.change_password')
  @HttpCode(200)
  @ApiZodBody(ChangePasswordRequestSchema)
  async changePassword(
    @CurrentUser() user: AuthUser,
    @Body(zod(ChangePasswordRequestSchema)) body: ChangePasswordRequest,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ) {
    const session = await this.auth.changePassword(user, body.currentPassword, body.newPassword);
    return this.startSession(session, req, res);
  }

  /** The current session, with a fresh CSRF token for the page that just loaded. */
  @Get('session')
  @Can('session.view')
  session(@CurrentUser() user: AuthUser, @Req() req: Request, @Res({ passthrough: true }) res: Response) {
    return { user: this.auth.describe(user), csrfToken: issueCsrfToken(this.csrf, req, res) };
  }

  @Post('logout')
  @Public()
  @HttpCode(204)
  async logout(@Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<void> {
    await this.auth.logout(sessionTokenFrom(req));
    res.clearCookie(SESSION_COOKIE, { path: '/' });
    res.clearCookie(CSRF_COOKIE, { path: '/' });
  }

  private startSession(session: IssuedSession, req: Request, res: Response) {
    res.cookie(SESSION_COOKIE, session.token, sessionCookieOptions(this.cfg.COOKIE_SECURE, this.cfg.SESSION_TTL_SECONDS * 1000));
    const csrfToken = issueCsrfToken(this.csrf, req, res, session.token);
    return { user: session.user, expiresAt: session.expiresAt, csrfToken };
  }
}
