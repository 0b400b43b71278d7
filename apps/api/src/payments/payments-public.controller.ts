import { Controller, Get, Headers, HttpCode, Param, Post, Req } from '@nestjs/common';
import type { RawBodyRequest } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import type { Request } from 'express';
import { Can, Public } from '../core/auth';
import { CurrentOwner, OwnerRoute, type LinkOwner } from '../owner';
import { CheckoutService } from './checkout.service';

/** The owner's side of paying: what is due, and a checkout for it (the owner link is the credential). */
@ApiTags('owner')
@OwnerRoute()
@Controller('owner/:token/payment')
export class OwnerPaymentController {
  constructor(private readonly checkout: CheckoutService) {}

  @Get()
  @Can('owner.view')
  view(@CurrentOwner() owner: LinkOwner) {
    return this.checkout.ownerView(owner);
  }

  /** Answers the hosted checkout's address; the web sends the owner there. */
  @Post('checkout')
  @HttpCode(200)
  @Throttle({ default: { limit: 10, ttl: 60_000 } })
  @Can('owner.pay')
  start(@CurrentOwner() owner: LinkOwner, @Param('token') token: string, @Req() req: Request) {
    return this.checkout.start(owner, token, `${req.protocol}://${req.get('host') ?? 'localhost'}`);
  }
}

/** The provider's notifications. Public; the signature over the raw body is the credential. */
@ApiTags('payments')
@Public()
@Controller('payments/webhook')
export class PaymentsWebhookController {
  constructor(private readonly checkout: CheckoutService) {}

  @Post()
  @HttpCode(200)
  receive(@Req() req: RawBodyRequest<Request>, @Headers('stripe-signature') signature: string | undefined) {
    return this.checkout.webhook(req.rawBody, signature);
  }
}
