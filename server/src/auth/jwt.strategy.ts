import { Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { Env } from '../config/env.js';
import { MembershipsService } from '../clubs/memberships.service.js';
import type { AccessClaims, Principal } from './principal.js';

/**
 * Verifies the bearer token, then loads the membership it names, so a role change or a removal
 * takes effect at once and the club always comes from the server's own record.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(env: Env, private readonly memberships: MembershipsService) {
    super({ jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), secretOrKey: env.JWT_SECRET, algorithms: ['HS256'] });
  }

  async validate(claims: AccessClaims): Promise<Principal | false> {
    const m = await this.memberships.findById(claims.mid);
    if (!m || m.userId !== claims.sub) return false;
    return { userId: m.userId, clubId: m.clubId, role: m.role, membershipId: m.id };
  }
}
