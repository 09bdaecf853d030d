import { ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { AppError } from '../common/app-error.js';
import { PUBLIC_KEY } from './principal.js';

/** Global guard: every route needs a valid access token unless marked @Public(). */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  canActivate(ctx: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean>(PUBLIC_KEY, [ctx.getHandler(), ctx.getClass()]);
    return isPublic ? true : super.canActivate(ctx);
  }

  handleRequest<T>(err: unknown, user: T, info: unknown): T {
    if (user) return user;
    if ((info as Error | undefined)?.name === 'TokenExpiredError') {
      throw new AppError(401, 'token_expired', 'Your session has expired. Refresh it or sign in again.');
    }
    if (err) throw err;
    throw new AppError(401, 'unauthorized', 'Sign in to continue.');
  }
}
