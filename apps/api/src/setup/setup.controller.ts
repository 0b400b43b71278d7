import { Controller, Get, HttpCode, Post, Req, Res, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { SetupRequestSchema, SignupRequestSchema, TokenRequestSchema, type SetupRequest, type SignupRequest, type TokenRequest } from '@benchproof/contracts';
import type { Request, Response } from 'express';
import { SessionResponder } from '../auth';
import { Public } from '../core/auth';
import { ZodBody } from '../core/http';
import { SetupThrottleGuard } from './setup-throttle.guard';
import { SetupService } from './setup.service';

@ApiTags('setup')
@Controller()
export class SetupController {
  constructor(
    private readonly setup: SetupService,
    private readonly respond: SessionResponder,
  ) {}

  /** Whether the web should show the first-run setup screen or the sign-up link. */
  @Get('setup')
  @Public()
  status() {
    return this.setup.status();
  }

  @Post('setup')
  @Public()
  @UseGuards(SetupThrottleGuard)
  @HttpCode(201)
  async setUp(@ZodBody(SetupRequestSchema) body: SetupRequest, @Req() req: Request, @Res({ passthrough: true }) res: Response) {
    return this.respond.outcome(await this.setup.setUp(body), req, res);
  }

  @Post('signup')
  @Public()
  @UseGuards(SetupThrottleGuard)
  @HttpCode(202)
  async signUp(@ZodBody(SignupRequestSchema) body: SignupRequest) {
    await this.setup.signUp(body);
    return { message: 'Check your e-mail: we sent a link to confirm the address and open your workshop.' };
  }

  @Post('signup/confirm')
  @Public()
  @HttpCode(200)
  async confirm(@ZodBody(TokenRequestSchema) body: TokenRequest, @Req() req: Request, @Res({ passthrough: true }) res: Response) {
    return this.respond.outcome(await this.setup.confirm(body.token), req, res);
  }
}
