import { Controller, HttpCode, Param, ParseIntPipe, Post, Req, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ForgotPasswordRequestSchema, ResetPasswordRequestSchema, type ForgotPasswordRequest, type ResetPasswordRequest } from '@benchproof/contracts';
import type { Request, Response } from 'express';
import { clientAddress, SessionResponder } from '../auth';
import { Can, CurrentUser, Public, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { PasswordResetsService } from './password-resets.service';

/** The same words whether or not the address has an account. */
const SENT = { message: 'If this address belongs to an account, a link to set a new password is on its way. It works for 30 minutes.' };

@ApiTags('password-resets')
@Controller()
export class PasswordResetsController {
  constructor(
    private readonly resets: PasswordResetsService,
    private readonly respond: SessionResponder,
  ) {}

  @Post('password-resets')
  @Public()
  @HttpCode(202)
  async request(@ZodBody(ForgotPasswordRequestSchema) body: ForgotPasswordRequest, @Req() req: Request) {
    await this.resets.request(body.email, clientAddress(req));
    return SENT;
  }

  @Post('password-resets/use')
  @Public()
  @HttpCode(200)
  async use(@ZodBody(ResetPasswordRequestSchema) body: ResetPasswordRequest, @Req() req: Request, @Res({ passthrough: true }) res: Response) {
    return this.respond.outcome(await this.resets.use(body.token, body.password), req, res);
  }

  /** A manager mails a staff member a link to set a new password. */
  @Post('users/:id/password-link')
  @Can('users.manage')
  @HttpCode(202)
  sendFor(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    this.resets.sendFor(user, id);
    return { message: 'A link to set a new password is on its way.' };
  }
}
