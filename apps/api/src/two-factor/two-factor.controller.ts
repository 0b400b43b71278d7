import { Controller, Get, HttpCode, Post, Put } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ConfirmTotpRequestSchema, RequireTwoFactorRequestSchema, type ConfirmTotpRequest, type RequireTwoFactorRequest } from '@benchproof/contracts';
import { z } from 'zod';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { TwoFactorService } from './two-factor.service';

const DisableRequestSchema = z.object({ password: z.string().min(1, 'Required').max(200) });

/** The signed-in user's own second factor, and the manager's shop-wide requirement. */
@ApiTags('two-factor')
@Controller()
export class TwoFactorController {
  constructor(private readonly twoFactor: TwoFactorService) {}

  @Get('account/two-factor')
  @Can('account.two_factor')
  status(@CurrentUser() user: AuthUser) {
    return this.twoFactor.status(user);
  }

  @Post('account/two-factor/start')
  @Can('account.two_factor')
  @HttpCode(200)
  start(@CurrentUser() user: AuthUser) {
    return this.twoFactor.start(user);
  }

  @Post('account/two-factor/confirm')
  @Can('account.two_factor')
  @HttpCode(200)
  confirm(@CurrentUser() user: AuthUser, @ZodBody(ConfirmTotpRequestSchema) body: ConfirmTotpRequest) {
    return this.twoFactor.confirm(user, body.code);
  }

  @Post('account/two-factor/disable')
  @Can('account.two_factor')
  @HttpCode(204)
  async disable(@CurrentUser() user: AuthUser, @ZodBody(DisableRequestSchema) body: { password: string }): Promise<void> {
    await this.twoFactor.disable(user, body.password);
  }

  @Put('shop/two-factor')
  @Can('shop.edit')
  require(@CurrentUser() user: AuthUser, @ZodBody(RequireTwoFactorRequestSchema) body: RequireTwoFactorRequest) {
    return this.twoFactor.setRequired(user, body.required);
  }
}
