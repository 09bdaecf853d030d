var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { Env } from '../config/env.js';
import { MembershipsService } from '../clubs/memberships.service.js';
/**
 * Verifies the bearer token, then loads the membership it names, so a role change or a removal
 * takes effect at once and the club always comes from the server's own record.
 */
let JwtStrategy = class JwtStrategy extends PassportStrategy(Strategy) {
    memberships;
    constructor(env, memberships) {
        super({ jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), secretOrKey: env.JWT_SECRET, algorithms: ['HS256'] });
        this.memberships = memberships;
    }
    async validate(claims) {
        const m = await this.memberships.findById(claims.mid);
        if (!m || m.userId !== claims.sub)
            return false;
        return { userId: m.userId, clubId: m.clubId, role: m.role, membershipId: m.id };
    }
};
JwtStrategy = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [Env, MembershipsService])
], JwtStrategy);
export { JwtStrategy };
//# sourceMappingURL=jwt.strategy.js.map