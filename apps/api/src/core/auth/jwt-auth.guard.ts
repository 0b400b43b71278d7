import { type ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { DomainError } from '../http';
import { IS_PUBLIC } from './auth.decorators';

/** The global guard: every route needs a signed-in user unless marked @Public(). */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  canActivate(ctx: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [ctx.getHandler(), ctx.getClass()]);
    return isPublic ? true : super.canActivate(ctx);
  }

  handleRequest<T>(err: unknown, user: T | false, info: unknown): T {
    if (err instanceof Error) throw err;
    if ((info as { name?: string } | undefined)?.name === 'TokenExpiredError') throw new DomainError('SESSION_EXPIRED');
    if (!user) throw new DomainError('UNAUTHENTICATED');
    return user;
  }
}
