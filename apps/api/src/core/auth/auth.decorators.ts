import { applyDecorators, createParamDecorator, type ExecutionContext, SetMetadata } from '@nestjs/common';
import { ApiExtension } from '@nestjs/swagger';
import type { Request } from 'express';
import type { AuthUser, Role } from './auth-user';

export const IS_PUBLIC = 'benchproof:public';
export const ROLES = 'benchproof:roles';

/** Lets a route answer without a session; marked `x-public` in the OpenAPI document too. */
export const Public = (): MethodDecorator & ClassDecorator =>
  applyDecorators(SetMetadata(IS_PUBLIC, true), ApiExtension('x-public', true));

/** Limits a route to the given roles; marked `x-roles` in the OpenAPI document. */
export const Roles = (...roles: Role[]): MethodDecorator & ClassDecorator =>
  applyDecorators(SetMetadata(ROLES, roles), ApiExtension('x-roles', roles));

/** The signed-in staff member, as checked by the session guard. */
export const CurrentUser = createParamDecorator((_: unknown, ctx: ExecutionContext): AuthUser => {
  const req = ctx.switchToHttp().getRequest<Request & { user: AuthUser }>();
  return req.user;
});
