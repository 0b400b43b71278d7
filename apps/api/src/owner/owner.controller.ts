import { Controller, Get, HttpCode, Param, ParseIntPipe, Post, Req, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import { OwnerConsentRequestSchema, OwnerDecisionsRequestSchema, type OwnerConsentRequest, type OwnerDecisionsRequest } from '@benchproof/contracts';
import type { Request, Response } from 'express';
import { z } from 'zod';
import { Can } from '../core/auth';
import { DomainError, sendFile, ZodBody, ZodParam } from '../core/http';
import { OwnerLinksService } from '../owner-links';
import { CurrentOwner, type LinkOwner, OwnerRoute } from './owner-link.guard';
import { OwnerMediaService } from './owner-media.service';
import { OwnerPageService } from './owner-page.service';

const OwnerVariantSchema = z.enum(['thumb', 'screen']);

/**
 * The public owner page's API. No session: the token in the path is the
 * credential (@OwnerRoute: rate limit, then the owner-link guard produces the
 * owner actor and checks each route's @Can against ACCESS_POLICY). It reaches one job.
 */
@ApiTags('owner')
@OwnerRoute()
@Controller('owner/:token')
export class OwnerController {
  constructor(
    private readonly page: OwnerPageService,
    private readonly links: OwnerLinksService,
    private readonly files: OwnerMediaService,
  ) {}

  @Get()
  @Can('owner.view')
  view(@CurrentOwner() owner: LinkOwner, @Param('token') token: string) {
    const dto = this.page.page(owner, token);
    this.links.viewed(owner);
    return dto;
  }

  /** Approve or decline pending items, all at once after the owner confirms; answers with the page as it is now. */
  @Post('decisions')
  @HttpCode(200)
  @Can('owner.decide')
  decide(@CurrentOwner() owner: LinkOwner, @Param('token') token: string, @ZodBody(OwnerDecisionsRequestSchema) body: OwnerDecisionsRequest) {
    this.page.decide(owner, body);
    return this.page.page(owner, token);
  }

  @Post('consent')
  @HttpCode(200)
  @Can('owner.consent')
  consent(@CurrentOwner() owner: LinkOwner, @ZodBody(OwnerConsentRequestSchema) body: OwnerConsentRequest) {
    return this.page.setConsent(owner, body);
  }

  /** Screen-sized shots only (a page has a dozen, hence the higher limit); never the original. */
  @Get('media/:mediaId/:variant')
  @Can('owner.view')
  @Throttle({ default: { limit: 1200, ttl: 60_000 } })
  async media(
    @CurrentOwner() owner: LinkOwner,
    @Param('mediaId', ParseIntPipe) mediaId: number,
    @ZodParam('variant', OwnerVariantSchema) variant: 'thumb' | 'screen',
    @Req() req: Request,
    @Res() res: Response,
  ) {
    await sendFile(req, res, await this.files.open(owner, mediaId, variant));
  }

  @Get('report.pdf')
  @Can('owner.view')
  async report(@CurrentOwner() owner: LinkOwner, @Req() req: Request, @Res() res: Response) {
    const file = await this.files.report(owner);
    if (!file) throw new DomainError('NOT_FOUND', 'The shop has not issued the report yet.');
    await sendFile(req, res, file);
  }
}
