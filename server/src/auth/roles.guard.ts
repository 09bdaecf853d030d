import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AppError } from '../common/app-error.js';
import { roleAtLeast, type Role } from '@breakline/sync-protocol';
import { MIN_ROLE_KEY, type Principal } from './principal.js';

/** Refuses a route whose @MinRole the caller's role in the active club does not reach. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(ctx: ExecutionContext): boolean {
    const min = this.reflector.getAllAndOverride<Role | undefined>(MIN_ROLE_KEY, [ctx.getHandler(), ctx.getClass()]);
    if (!min) return true;
    const p: Principal | undefined = ctx.switchToHttp().getRequest().user;
    if (p && roleAtLeast(p.role, min)) return true;
    throw new AppError(403, 'forbidden', `This needs the ${min} role or higher in this club; you are signed in as ${p?.role ?? 'nobody'}.`);
  }
}
