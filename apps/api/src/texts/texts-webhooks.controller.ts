import { Body, Controller, Header, Headers, HttpCode, Post, Req } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../core/auth';
import { TextsWebhooks } from './texts-webhooks.service';

/** An empty reply: the provider sends nothing back to the owner on our behalf. */
const NO_REPLY = '<?xml version="1.0" encoding="UTF-8"?><Response></Response>';

const formParams = (body: unknown): Record<string, string> =>
  Object.fromEntries(Object.entries((body ?? {}) as Record<string, unknown>).map(([k, v]) => [k, String(v)]));

/** The provider's notifications (form posts). Public; the X-Twilio-Signature over URL and params is the credential. */
@ApiTags('texts')
@Public()
@Controller('texts')
export class TextsWebhooksController {
  constructor(private readonly hooks: TextsWebhooks) {}

  @Post('status')
  @HttpCode(200)
  status(@Req() req: Request, @Headers('x-twilio-signature') signature: string | undefined, @Body() body: unknown) {
    return this.hooks.status(req.originalUrl, signature, formParams(body));
  }

  @Post('inbound')
  @HttpCode(200)
  @Header('content-type', 'text/xml')
  inbound(@Req() req: Request, @Headers('x-twilio-signature') signature: string | undefined, @Body() body: unknown): string {
    this.hooks.inbound(req.originalUrl, signature, formParams(body));
    return NO_REPLY;
  }
}
