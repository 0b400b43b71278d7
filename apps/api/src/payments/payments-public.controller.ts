import { Controller, Get, Headers, HttpCode, Param, Post, Req, UseGuards } from '@nestjs/common';
import type { RawBodyRequest } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Throttle, ThrottlerGuard } from '@nestjs/throttler';
import type { Request } from 'express';
import { assertCan, Public } from '../core/auth';
import { CurrentOwner, OwnerLinkGuard, type OwnerActor } from '../owner';
import { CheckoutService } from './checkout.service';

/** The owner's side of paying: what is due, and a checkout for it (the owner link is the credential). */
@ApiTags('owner')
@Public()
@UseGuards(ThrottlerGuard, OwnerLinkGuard)
@Throttle({ default: { limit: 120, ttl: 60_000 } })
@Controller('owner/:token/payment')
export class OwnerPaymentController {
  constructor(private readonly checkout: CheckoutService) {}

  @Get()
  view(@CurrentOwner() owner: OwnerActor) {
    assertCan(owner, 'owner.view');
    return this.checkout.ownerView(owner);
  }

  /** Answers the hosted checkout's address; the web sends the owner there. */
  @Post('checkout')
  @HttpCode(200)
  @Throttle({ default: { limit: 10, ttl: 60_000 } })
  start(@CurrentOwner() owner: OwnerActor, @Param('token') token: string, @Req() req: Request) {
    assertCan(owner, 'owner.pay');
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
