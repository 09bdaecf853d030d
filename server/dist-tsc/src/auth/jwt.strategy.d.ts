import { Strategy } from 'passport-jwt';
import { Env } from '../config/env.js';
import { MembershipsService } from '../clubs/memberships.service.js';
import type { AccessClaims, Principal } from './principal.js';
declare const JwtStrategy_base: new (...args: [opt: import("passport-jwt").StrategyOptionsWithRequest] | [opt: import("passport-jwt").StrategyOptionsWithoutRequest]) => Strategy & {
    validate(...args: any[]): unknown;
};
/**
 * Verifies the bearer token, then loads the membership it names, so a role change or a removal
 * takes effect at once and the club always comes from the server's own record.
 */
export declare class JwtStrategy extends JwtStrategy_base {
    private readonly memberships;
    constructor(env: Env, memberships: MembershipsService);
    validate(claims: AccessClaims): Promise<Principal | false>;
}
export {};
