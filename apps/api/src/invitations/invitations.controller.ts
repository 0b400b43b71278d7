import { Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Post, Req, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  AcceptInvitationRequestSchema,
  InviteRequestSchema,
  TokenRequestSchema,
  type AcceptInvitationRequest,
  type InviteRequest,
  type TokenRequest,
} from '@benchproof/contracts';
import type { Request, Response } from 'express';
import { SessionResponder } from '../auth';
import { Can, CurrentUser, Public, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { InvitationsService } from './invitations.service';

@ApiTags('invitations')
@Controller('invitations')
export class InvitationsController {
  constructor(
    private readonly invitations: InvitationsService,
    private readonly respond: SessionResponder,
  ) {}

  /** Invitations not yet accepted or withdrawn (the users screen lists them). */
  @Get()
  @Can('users.manage')
  list(@CurrentUser() user: AuthUser) {
    return this.invitations.pending(user);
  }

  @Post()
  @Can('users.manage')
  invite(@CurrentUser() user: AuthUser, @ZodBody(InviteRequestSchema) body: InviteRequest) {
    return this.invitations.invite(user, body);
  }

  @Post(':id/resend')
  @Can('users.manage')
  @HttpCode(200)
  resend(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.invitations.resend(user, id);
  }

  @Delete(':id')
  @Can('users.manage')
  @HttpCode(204)
  withdraw(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number): void {
    this.invitations.withdraw(user, id);
  }

  /** The token travels in the body (the web reads it from the link's #fragment), never in a URL the server logs. */
  @Post('preview')
  @Public()
  @HttpCode(200)
  preview(@ZodBody(TokenRequestSchema) body: TokenRequest) {
    return this.invitations.preview(body.token);
  }

  @Post('accept')
  @Public()
  @HttpCode(200)
  async accept(@ZodBody(AcceptInvitationRequestSchema) body: AcceptInvitationRequest, @Req() req: Request, @Res({ passthrough: true }) res: Response) {
    return this.respond.outcome(await this.invitations.accept(body.token, body.password), req, res);
  }
}
