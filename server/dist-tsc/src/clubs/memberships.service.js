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
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { Membership } from './membership.entity.js';
let MembershipsService = class MembershipsService {
    repo;
    constructor(repo) {
        this.repo = repo;
    }
    findById(id) {
        return this.repo.findOne({ where: { id } });
    }
    /** A person's memberships with their clubs, oldest first (the default club is the first). */
    forUser(userId) {
        return this.repo.find({ where: { userId }, relations: { club: true }, order: { createdAt: 'ASC' } });
    }
    /** Members of one club: always filtered by the caller's club id. */
    inClub(clubId) {
        return this.repo.find({ where: { clubId }, relations: { user: true }, order: { createdAt: 'ASC' } });
    }
};
MembershipsService = __decorate([
    Injectable(),
    __param(0, InjectRepository(Membership)),
    __metadata("design:paramtypes", [Repository])
], MembershipsService);
export { MembershipsService };
//# sourceMappingURL=memberships.service.js.map