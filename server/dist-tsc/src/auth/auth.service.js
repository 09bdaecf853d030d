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
import { JwtService } from '@nestjs/jwt';
import bcrypt from 'bcryptjs';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
import { UsersService } from '../users/users.service.js';
import { MembershipsService } from '../clubs/memberships.service.js';
import { toClubDto } from '../clubs/clubs.service.js';
import { RefreshTokensService } from './refresh-tokens.service.js';
const BAD_CREDENTIALS = 'E-mail or password is not right.';
// Compared against when the e-mail is unknown, so both failures take the same time.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', 10);
let AuthService = class AuthService {
    env;
    jwt;
    users;
    memberships;
    refreshTokens;
    constructor(env, jwt, users, memberships, refreshTokens) {
        this.env = env;
        this.jwt = jwt;
        this.users = users;
        this.memberships = memberships;
        this.refreshTokens = refreshTokens;
    }
    async login(email, password, clubId) {
        const user = await this.users.findByEmail(email);
        const ok = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
        if (!user || !ok)
            throw new AppError(401, 'invalid_credentials', BAD_CREDENTIALS);
        return this.session(user, clubId);
    }
    async refresh(token, clubId) {
        const spent = await this.refreshTokens.rotate(token);
        const user = await this.users.findById(spent.userId);
        if (!user)
            throw new AppError(401, 'unauthorized', 'This sign-in has ended. Sign in again.');
        return this.session(user, clubId ?? spent.clubId, spent.next);
    }
    /** Signs in a person whose identity another step proved (an accepted invitation, a reset link). */
    startSession(user, clubId) {
        return this.session(user, clubId);
    }
    logout(token) {
        return this.refreshTokens.revoke(token);
    }
    async me(p) {
        const user = await this.users.findById(p.userId);
        if (!user)
            throw new AppError(401, 'unauthorized', 'Sign in to continue.');
        return this.describe(user, p.clubId);
    }
    async session(user, clubId, next) {
        const me = await this.describe(user, clubId);
        const membershipId = me.membershipId;
        const claims = { sub: user.id, mid: membershipId };
        const accessToken = await this.jwt.signAsync(claims, { expiresIn: this.env.ACCESS_TOKEN_TTL_SECONDS });
        const refreshToken = next ? await next(me.activeClub.id) : await this.refreshTokens.issue(user.id, me.activeClub.id);
        const accessExpiresAt = new Date(Date.now() + this.env.ACCESS_TOKEN_TTL_SECONDS * 1000).toISOString();
        const { membershipId: _, ...dto } = me;
        return { ...dto, accessToken, refreshToken, accessExpiresAt };
    }
    /** The person, their clubs, and the active one: the asked-for club if theirs, else the first. */
    async describe(user, clubId) {
        const all = await this.memberships.forUser(user.id);
        if (!all.length)
            throw new AppError(403, 'forbidden', 'Your account is not a member of any club yet. Ask your club admin for an invitation.');
        const active = clubId ? all.find((m) => m.clubId === clubId) : all[0];
        if (!active)
            throw new AppError(403, 'forbidden', 'You are not a member of that club.');
        return {
            membershipId: active.id,
            user: { id: user.id, email: user.email, displayName: user.displayName },
            activeClub: { ...toClubDto(active.club), role: active.role },
            memberships: all.map((m) => ({ clubId: m.clubId, clubName: m.club.name, role: m.role })),
        };
    }
};
AuthService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [Env,
        JwtService,
        UsersService,
        MembershipsService,
        RefreshTokensService])
], AuthService);
export { AuthService };
//# sourceMappingURL=auth.service.js.map