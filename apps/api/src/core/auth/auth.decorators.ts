import { applyDecorators, createParamDecorator, type ExecutionContext, SetMetadata } from '@nestjs/common';
import { ApiExtension } from '@nestjs/swagger';
import { type Action, type Actor, rolesFor } from '@benchproof/contracts';
import type { Request } from 'express';
import type { AuthUser } from './auth-user';

export const IS_PUBLIC = 'benchproof:public';
export const ACTION = 'benchproof:action';
export const OWNER_LINK = 'benchproof:owner-link';

/** Lets a route answer without a session; marked `x-public` in the OpenAPI document too. */
export const Public = (): MethodDecorator & ClassDecorator => applyDecorators(SetMetadata(IS_PUBLIC, true), ApiExtension('x-public', true));

/**
 * Marks a route whose caller is an owner-link holder rather than signed-in staff: no
 * session is asked for, and the policy check waits for the owner-link guard, which
 * produces the owner actor and then runs the same check (`checkRoutePolicy`) against
 * the route's `@Can`. Use the owner feature's `@OwnerRoute()`, which adds that guard.
 * The OpenAPI document marks such routes `x-owner-link` (the route matrix reads it).
 */
export const OwnerLink = (): MethodDecorator & ClassDecorator =>
  applyDecorators(SetMetadata(IS_PUBLIC, true), SetMetadata(OWNER_LINK, true), ApiExtension('x-owner-link', true));

/**
 * Names the policy action a route performs (ACCESS_POLICY in libs/contracts). The
 * PolicyGuard lets the caller through only if the policy allows it; the OpenAPI
 * document carries the action (`x-action`) and the roles it resolves to (`x-roles`).
 */
export const Can = (action: Action): MethodDecorator & ClassDecorator =>
  applyDecorators(SetMetadata(ACTION, action), ApiExtension('x-action', action), ApiExtension('x-roles', rolesFor(action)));

/** The signed-in staff member, as checked by the session guard. */
export const CurrentUser = createParamDecorator((_: unknown, ctx: ExecutionContext): AuthUser => {
  const req = ctx.switchToHttp().getRequest<Request & { user: AuthUser }>();
  return req.user;
});

/** Who is calling, staff or owner link, as set by the policy guard or the owner-link guard. */
export const CurrentActor = createParamDecorator((_: unknown, ctx: ExecutionContext): Actor => {
  const req = ctx.switchToHttp().getRequest<Request & { actor: Actor }>();
  return req.actor;
});
