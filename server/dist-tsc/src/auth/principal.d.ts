import type { Role } from '@breakline/sync-protocol';
/** Who is calling, resolved from the access token and the membership it names. */
export interface Principal {
    userId: string;
    clubId: string;
    role: Role;
    membershipId: string;
}
export interface AccessClaims {
    sub: string;
    mid: string;
}
export declare const CurrentPrincipal: (...dataOrPipes: unknown[]) => ParameterDecorator;
export declare const PUBLIC_KEY = "breakline:public";
/** Marks a route that needs no sign-in. */
export declare const Public: () => import("@nestjs/common").CustomDecorator<string>;
export declare const MIN_ROLE_KEY = "breakline:min-role";
/** The lowest role allowed on a route (supervisor lets admins in too). */
export declare const MinRole: (role: Role) => import("@nestjs/common").CustomDecorator<string>;
