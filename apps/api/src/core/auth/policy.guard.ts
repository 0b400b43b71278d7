import { type CanActivate, type ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { type Action, type Actor, actorCan, rolesFor } from '@benchproof/contracts';
import type { Request } from 'express';
import { DomainError } from '../http';
import { ACTION, IS_PUBLIC, OWNER_LINK } from './auth.decorators';
import type { AuthUser } from './auth-user';

type ActorRequest = Request & { user?: AuthUser; actor?: Actor };

/** The staff actor for a signed-in user. */
export const staffActor = (user: AuthUser): Actor => ({ kind: 'staff', shopId: user.shopId, userId: user.id, role: user.role });

/** FORBIDDEN unless ACCESS_POLICY lets this actor do the action. Owner-link guards call this after setting req.actor. */
export function assertCan(actor: Actor | undefined, action: Action): void {
  if (actor && actorCan(actor, action)) return;
  const who = actor?.kind === 'owner' ? 'an owner link' : `the ${rolesFor(action).join(' or ')} role`;
  throw new DomainError('FORBIDDEN', actor?.kind === 'owner' ? `This is not open to ${who}.` : `This needs ${who}.`, { action });
}

/**
 * The one policy check of a route: the `@Can` action it names, for the actor on the
 * request (staff from the session, or the owner actor the owner-link guard produced).
 * A route that names no action is refused.
 */
export function checkRoutePolicy(reflector: Reflector, ctx: ExecutionContext): void {
  const action = reflector.getAllAndOverride<Action | undefined>(ACTION, [ctx.getHandler(), ctx.getClass()]);
  if (!action) throw new DomainError('FORBIDDEN', 'This route names no policy action.');
  assertCan(ctx.switchToHttp().getRequest<ActorRequest>().actor, action);
}

/**
 * Global guard after the session guard: sets req.actor for staff and checks the
 * route's @Can action. A signed-in route without @Can is refused, so a new route
 * cannot slip past the policy (the route-matrix test lists any that try).
 */
@Injectable()
export class PolicyGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(ctx: ExecutionContext): boolean {
    const targets = [ctx.getHandler(), ctx.getClass()];
    const req = ctx.switchToHttp().getRequest<ActorRequest>();
    if (req.user) req.actor = staffActor(req.user);
    // Owner-link routes: the owner-link guard (after the rate limiter) sets the actor and runs checkRoutePolicy.
    if (this.reflector.getAllAndOverride<boolean>(OWNER_LINK, targets)) return true;
    // Public routes (login, health) have no actor to check.
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;
    checkRoutePolicy(this.reflector, ctx);
    return true;
  }
}
