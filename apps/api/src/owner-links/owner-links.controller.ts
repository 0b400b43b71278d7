import { Controller, Get, HttpCode, Param, ParseIntPipe, Post, Sse } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CreateOwnerLinkRequestSchema, type AuditEvent, type CreateOwnerLinkRequest } from '@benchproof/contracts';
import { interval, map, merge, type Observable } from 'rxjs';
import { AuditService } from '../audit';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { JobAccess } from '../jobs';
import { OwnerLiveEvents } from './owner-events';
import { OwnerLinksService } from './owner-links.service';

/** Audit actions staff see in the job's owner panel. */
const OWNER_ACTIONS = new Set(['owner.viewed', 'owner_link.created', 'owner_link.revoked', 'recommendation.decided', 'consent.granted', 'consent.revoked']);

/** Staff side of owner links: create (copy or e-mail), list with expiry, revoke, and watch what the owner does. */
@ApiTags('owner-links')
@Controller('jobs/:jobId')
export class OwnerLinksController {
  constructor(
    private readonly links: OwnerLinksService,
    private readonly audit: AuditService,
    private readonly access: JobAccess,
    private readonly bus: OwnerLiveEvents,
  ) {}

  @Get('owner-links')
  @Can('owner_links.view')
  list(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number) {
    return this.links.list(user, jobId);
  }

  @Post('owner-links')
  @Can('owner_links.manage')
  create(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @ZodBody(CreateOwnerLinkRequestSchema) body: CreateOwnerLinkRequest) {
    return this.links.create(user, jobId, body);
  }

  @Post('owner-links/:linkId/revoke')
  @HttpCode(200)
  @Can('owner_links.manage')
  revoke(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @Param('linkId', ParseIntPipe) linkId: number) {
    return this.links.revoke(user, jobId, linkId);
  }

  /** Owner views, decisions and consent changes of this job, newest first (audit events). */
  @Get('owner-activity')
  @Can('owner_links.view')
  activity(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number): AuditEvent[] {
    this.access.read(user, jobId);
    return this.audit.list(user.shopId, 'job', jobId).filter((e) => OWNER_ACTIONS.has(e.action));
  }

  /** Server-Sent Events: the job page refreshes when the owner acts; a comment every 25 s keeps proxies from closing it. */
  @Sse('owner-events')
  @Can('jobs.view')
  events(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number): Observable<{ type?: string; data: unknown }> {
    this.access.read(user, jobId);
    return merge(this.bus.forJob(user.shopId, jobId), interval(25_000).pipe(map(() => ({ type: 'ping', data: {} }))));
  }
}
