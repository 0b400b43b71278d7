import { Controller, Get, HttpCode, Inject, Post, Req, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  ChallengeRequestSchema,
  ChangePasswordRequestSchema,
  CodeStepRequestSchema,
  LoginRequestSchema,
  type ChallengeRequest,
  type ChangePasswordRequest,
  type CodeStepRequest,
  type LoginRequest,
} from '@benchproof/contracts';
import type { DoubleCsrfUtilities } from 'csrf-csrf';
import type { Request, Response } from 'express';
import { Can, CSRF, CSRF_COOKIE, CurrentUser, issueCsrfToken, Public, SESSION_COOKIE, sessionTokenFrom, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { AuthService } from './auth.service';
import { clientAddress, SessionResponder } from './session-responder';

/**
 * Sessions live in an httpOnly cookie so `<img>` and `<video>` tags load protected
 * media without tokens in URLs; every state-changing call echoes a CSRF token.
 * With a second factor, the password answers a challenge instead, and only the code step opens a session.
 */
@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly respond: SessionResponder,
    @Inject(CSRF) private readonly csrf: DoubleCsrfUtilities,
  ) {}

  @Post('login')
  @Public()
  @HttpCode(200)
  async login(@ZodBody(LoginRequestSchema) body: LoginRequest, @Req() req: Request, @Res({ passthrough: true }) res: Response) {
    return this.respond.outcome(await this.auth.login(body.email, body.password, clientAddress(req)), req, res);
  }

  /** Second step: the six-digit code (or a recovery code) for the challenge the password step gave. */
  @Post('login/code')
  @Public()
  @HttpCode(200)
  async code(@ZodBody(CodeStepRequestSchema) body: CodeStepRequest, @Req() req: Request, @Res({ passthrough: true }) res: Response) {
    return this.respond.session(await this.auth.withCode(body.challenge, body.code, clientAddress(req)), req, res);
  }

  /** The shop requires a second factor this account has not set up: its secret and QR code, before any session. */
  @Post('login/enrol')
  @Public()
  @HttpCode(200)
  enrol(@ZodBody(ChallengeRequestSchema) body: ChallengeRequest) {
    return this.auth.enrolStart(body.challenge);
  }

  /** Confirms that set-up with a first code: a session and the ten recovery codes, shown this once. */
  @Post('login/enrol/confirm')
  @Public()
  @HttpCode(200)
  async enrolConfirm(@ZodBody(CodeStepRequestSchema) body: CodeStepRequest, @Req() req: Request, @Res({ passthrough: true }) res: Response) {
    const { session, recoveryCodes } = await this.auth.enrolConfirm(body.challenge, body.code, clientAddress(req));
    return { ...this.respond.session(session, req, res), recoveryCodes };
  }

  /** Changes the caller's password, ends all their sessions and starts a new one on this device. */
  @Post('password')
  @Can('account.change_password')
  @HttpCode(200)
  async changePassword(
    @CurrentUser() user: AuthUser,
    @ZodBody(ChangePasswordRequestSchema) body: ChangePasswordRequest,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ) {
    return this.respond.session(await this.auth.changePassword(user, body.currentPassword, body.newPassword), req, res);
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
}
