import { applyDecorators, type CanActivate, createParamDecorator, type ExecutionContext, Injectable, UseGuards } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { Throttle, ThrottlerGuard } from '@nestjs/throttler';
import type { Request } from 'express';
import { checkRoutePolicy, OwnerLink } from '../core/auth';
import { DomainError } from '../core/http';
import { type OwnerActor, OwnerLinksService } from '../owner-links';

/** The owner actor with the expiry of the link it came through (shown on the owner page). */
export type LinkOwner = OwnerActor & { expiresAt: Date };
type OwnerRequest = Request & { actor?: LinkOwner | { kind: 'staff' } };

/**
 * The owner-link guard: the :token path parameter must resolve to a live owner
 * link, which becomes the request's actor (one shop, one job). Then the route's
 * `@Can` is checked against ACCESS_POLICY by the same function the policy guard
 * uses for staff. It runs after the rate limiter, so guessing is throttled.
 */
@Injectable()
export class OwnerLinkGuard implements CanActivate {
  constructor(
    private readonly links: OwnerLinksService,
    private readonly reflector: Reflector,
  ) {}

  canActivate(ctx: ExecutionContext): boolean {
    const req = ctx.switchToHttp().getRequest<OwnerRequest>();
    const token = req.params.token;
    if (typeof token !== 'string' || token.length > 200) throw new DomainError('OWNER_LINK_INVALID');
    req.actor = this.links.resolve(token);
    checkRoutePolicy(this.reflector, ctx);
    return true;
  }
}

/**
 * A controller (or route) called through an owner link: no staff session, a
 * per-address rate limit, then the owner-link guard. Each route still names its
 * action with `@Can('owner.view' | 'owner.decide' | 'owner.consent')`.
 */
export const OwnerRoute = (): ClassDecorator & MethodDecorator =>
  applyDecorators(OwnerLink(), UseGuards(ThrottlerGuard, OwnerLinkGuard), Throttle({ default: { limit: 120, ttl: 60_000 } }));

/** The owner actor the owner-link guard produced (`@CurrentActor()` typed for owner routes). */
export const CurrentOwner = createParamDecorator((_: unknown, ctx: ExecutionContext): LinkOwner => {
  const actor = ctx.switchToHttp().getRequest<OwnerRequest>().actor;
  if (actor?.kind !== 'owner') throw new DomainError('OWNER_LINK_INVALID');
  return actor;
});
