var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
var __param = (this && this.__param) || function (paramIndex, decorator) {
    return function (target, key) { decorator(target, key, paramIndex); }
};
import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { IsNull, Repository } from 'typeorm';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
import { RefreshToken } from './refresh-token.entity.js';
const sha256 = (s) => createHash('sha256').update(s).digest('hex');
const refused = () => new AppError(401, 'unauthorized', 'This sign-in has ended. Sign in again.');
/** Issues, rotates and revokes refresh tokens of the form `<id>.<secret>`. */
let RefreshTokensService = class RefreshTokensService {
    repo;
    env;
    constructor(repo, env) {
        this.repo = repo;
        this.env = env;
    }
    async issue(userId, clubId, familyId) {
        const secret = randomBytes(32).toString('base64url');
        const row = await this.repo.save(this.repo.create({
            userId, clubId, familyId: familyId ?? crypto.randomUUID(), secretHash: sha256(secret),
            expiresAt: new Date(Date.now() + this.env.REFRESH_TOKEN_TTL_DAYS * 86_400_000), revokedAt: null,
        }));
        return `${row.id}.${secret}`;
    }
    /** Spends a token: it is revoked and its successor returned. A spent token shown again ends the family. */
    async rotate(token) {
        const row = await this.find(token);
        if (row.revokedAt) {
            await this.repo.update({ familyId: row.familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
            throw refused();
        }
        if (row.expiresAt.getTime() <= Date.now())
            throw refused();
        const res = await this.repo.update({ id: row.id, revokedAt: IsNull() }, { revokedAt: new Date() });
        if (!res.affected)
            throw refused(); // spent by a concurrent request
        return { userId: row.userId, clubId: row.clubId, next: (clubId) => this.issue(row.userId, clubId ?? row.clubId, row.familyId) };
    }
    async revoke(token) {
        const row = await this.find(token).catch(() => null);
        if (row)
            await this.repo.update({ familyId: row.familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
    }
    async find(token) {
        const [id, secret] = token.split('.');
        if (!id || !secret || !/^[0-9a-f-]{36}$/i.test(id))
            throw refused();
        const row = await this.repo.findOne({ where: { id } });
        if (!row)
            throw refused();
        const a = Buffer.from(row.secretHash, 'hex');
        const b = Buffer.from(sha256(secret), 'hex');
        if (a.length !== b.length || !timingSafeEqual(a, b))
            throw refused();
        return row;
    }
};
RefreshTokensService = __decorate([
    Injectable(),
    __param(0, InjectRepository(RefreshToken)),
    __metadata("design:paramtypes", [Repository, Env])
], RefreshTokensService);
export { RefreshTokensService };
//# sourceMappingURL=refresh-tokens.service.js.map