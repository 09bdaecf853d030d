import { createParamDecorator, ExecutionContext, SetMetadata } from '@nestjs/common';
import type { Role } from '@breakline/sync-protocol';

/** Who is calling, resolved from the access token and the membership it names. */
export interface Principal { userId: string; clubId: string; role: Role; membershipId: string }

export interface AccessClaims { sub: string; mid: string }

export const CurrentPrincipal = createParamDecorator(
  (_: unknown, ctx: ExecutionContext): Principal => ctx.switchToHttp().getRequest().user,
);

export const PUBLIC_KEY = 'breakline:public';
/** Marks a route that needs no sign-in. */
export const Public = () => SetMetadata(PUBLIC_KEY, true);

export const MIN_ROLE_KEY = 'breakline:min-role';
/** The lowest role allowed on a route (supervisor lets admins in too). */
export const MinRole = (role: Role) => SetMetadata(MIN_ROLE_KEY, role);
