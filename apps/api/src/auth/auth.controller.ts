import { Body, Controller, Get, HttpCode, Inject, Post, Req, Res, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import { LoginRequestSchema, type LoginRequest } from '@benchproof/contracts';
import type { DoubleCsrfUtilities } from 'csrf-csrf';
import type { Request, Response } from 'express';
import { APP_CONFIG, type AppConfig } from '../config';
import { Can, CSRF, CSRF_COOKIE, CurrentUser, issueCsrfToken, Public, SESSION_COOKIE, sessionCookieOptions, type AuthUser } from '../core/auth';
import { ApiZodBody, zod } from '../core/http';
import { AuthService } from './auth.service';

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
  @UseGuards(ThrottlerGuard)
  @ApiZodBody(LoginRequestSchema)
  async login(@Body(zod(LoginRequestSchema)) body: LoginRequest, @Req() req: Request, @Res({ passthrough: true }) res: Response) {
    const session = await this.auth.login(body.email, body.password);
    res.cookie(SESSION_COOKIE, session.token, sessionCookieOptions(this.cfg.COOKIE_SECURE, this.cfg.SESSION_TTL_SECONDS * 1000));
    const csrfToken = issueCsrfToken(this.csrf, req, res, session.token);
    return { user: session.user, expiresAt: session.expiresAt, csrfToken };
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
  logout(@Res({ passthrough: true }) res: Response): void {
    res.clearCookie(SESSION_COOKIE, { path: '/' });
    res.clearCookie(CSRF_COOKIE, { path: '/' });
  }
}
