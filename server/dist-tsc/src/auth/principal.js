import { createParamDecorator, SetMetadata } from '@nestjs/common';
export const CurrentPrincipal = createParamDecorator((_, ctx) => ctx.switchToHttp().getRequest().user);
export const PUBLIC_KEY = 'breakline:public';
/** Marks a route that needs no sign-in. */
export const Public = () => SetMetadata(PUBLIC_KEY, true);
export const MIN_ROLE_KEY = 'breakline:min-role';
/** The lowest role allowed on a route (supervisor lets admins in too). */
export const MinRole = (role) => SetMetadata(MIN_ROLE_KEY, role);
//# sourceMappingURL=principal.js.map