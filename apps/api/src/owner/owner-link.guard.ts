import { type CanActivate, createParamDecorator, type ExecutionContext, Injectable } from '@nestjs/common';
import type { Request } from 'express';
import { DomainError } from '../core/http';
import { OwnerLinksService } from './owner-links.service';
import type { OwnerActor } from './owner.ports';

type OwnerRequest = Request & { owner?: OwnerActor & { expiresAt: Date } };

/**
 * Owner routes are @Public for the session guard; this guard is what lets a
 * request in: the :token path parameter must resolve to a live owner link.
 * The resulting actor reaches exactly one job.
 */
@Injectable()
export class OwnerLinkGuard implements CanActivate {
  constructor(private readonly links: OwnerLinksService) {}

  canActivate(ctx: ExecutionContext): boolean {
    const req = ctx.switchToHttp().getRequest<OwnerRequest>();
    const token = req.params.token;
    if (typeof token !== 'string' || token.length > 200) throw new DomainError('OWNER_LINK_INVALID');
    req.owner = this.links.resolve(token);
    return true;
  }
}

/** The owner-link visitor checked by OwnerLinkGuard. */
export const CurrentOwner = createParamDecorator((_: unknown, ctx: ExecutionContext): OwnerActor & { expiresAt: Date } => {
  const owner = ctx.switchToHttp().getRequest<OwnerRequest>().owner;
  if (!owner) throw new DomainError('OWNER_LINK_INVALID');
  return owner;
});
