import { Body, Controller, Get, Headers, HttpCode, Param, ParseIntPipe, Post, Res, UseGuards } from '@nestjs/common';
import { ApiParam, ApiTags } from '@nestjs/swagger';
import { Throttle, ThrottlerGuard } from '@nestjs/throttler';
import { OwnerConsentRequestSchema, OwnerDecisionsRequestSchema, type OwnerConsentRequest, type OwnerDecisionsRequest } from '@benchproof/contracts';
import type { Response } from 'express';
import { z } from 'zod';
import { Public } from '../core/auth';
import { ApiZodBody, DomainError, zod } from '../core/http';
import { CurrentOwner, OwnerLinkGuard } from './owner-link.guard';
import { OwnerLinksService } from './owner-links.service';
import { OwnerMediaService } from './owner-media.service';
import { OwnerPageService } from './owner-page.service';
import type { OwnerActor, StreamReply } from './owner.ports';

const OwnerVariantSchema = z.enum(['thumb', 'screen']);
type Owner = OwnerActor & { expiresAt: Date };

/**
 * The owner page's API. No session: the token in the path is the credential
 * (OwnerLinkGuard), it reaches one job, and every route is rate-limited per
 * address so a token cannot be guessed by brute force.
 */
@ApiTags('owner')
@Public()
@UseGuards(ThrottlerGuard, OwnerLinkGuard)
@Throttle({ default: { limit: 120, ttl: 60_000 } })
@Controller('owner/:token')
export class OwnerController {
  constructor(
    private readonly page: OwnerPageService,
    private readonly links: OwnerLinksService,
    private readonly files: OwnerMediaService,
  ) {}

  @Get()
  view(@CurrentOwner() owner: Owner, @Param('token') token: string) {
    const dto = this.page.page(owner, token);
    this.links.viewed(owner);
    return dto;
  }

  /** Approve or decline pending items, all at once after the owner confirms; answers with the page as it is now. */
  @Post('decisions')
  @HttpCode(200)
  @ApiZodBody(OwnerDecisionsRequestSchema)
  decide(@CurrentOwner() owner: Owner, @Param('token') token: string, @Body(zod(OwnerDecisionsRequestSchema)) body: OwnerDecisionsRequest) {
    this.page.decide(owner, body);
    return this.page.page(owner, token);
  }

  @Post('consent')
  @HttpCode(200)
  @ApiZodBody(OwnerConsentRequestSchema)
  consent(@CurrentOwner() owner: Owner, @Body(zod(OwnerConsentRequestSchema)) body: OwnerConsentRequest) {
    return this.page.setConsent(owner, body);
  }

  /** Screen-sized shots only (a page has a dozen, hence the higher limit); never the original. */
  @Get('media/:mediaId/:variant')
  @Throttle({ default: { limit: 1200, ttl: 60_000 } })
  @ApiParam({ name: 'variant', enum: OwnerVariantSchema.options })
  async media(
    @CurrentOwner() owner: Owner,
    @Param('mediaId', ParseIntPipe) mediaId: number,
    @Param('variant', zod(OwnerVariantSchema)) variant: 'thumb' | 'screen',
    @Headers() h: Record<string, string | undefined>,
    @Res() res: Response,
  ) {
    send(await this.files.open(owner, mediaId, variant, { range: h.range, ifNoneMatch: h['if-none-match'] }), res);
  }

  @Get('report.pdf')
  async report(@CurrentOwner() owner: Owner, @Res() res: Response) {
    const reply = await this.files.report(owner);
    if (!reply) throw new DomainError('NOT_FOUND', 'The shop has not issued the report yet.');
    send(reply, res);
  }
}

function send(reply: StreamReply, res: Response): void {
  res.status(reply.status).set(reply.headers);
  if (!reply.body) {
    res.end();
    return;
  }
  reply.body.on('error', () => res.destroy());
  reply.body.pipe(res);
}
