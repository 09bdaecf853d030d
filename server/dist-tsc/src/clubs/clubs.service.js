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
import { AppError } from '../common/app-error.js';
import { Club } from './club.entity.js';
import { MembershipsService } from './memberships.service.js';
let ClubsService = class ClubsService {
    clubs;
    memberships;
    constructor(clubs, memberships) {
        this.clubs = clubs;
        this.memberships = memberships;
    }
    /** A club's settings, only for the caller's own active club. */
    async get(p, clubId) {
        // Another club's id answers exactly like an unknown one: nothing leaks about other tenants.
        const club = clubId === p.clubId ? await this.clubs.findOne({ where: { id: p.clubId } }) : null;
        if (!club)
            throw new AppError(404, 'not_found', 'No such club among yours.');
        return toClubDto(club);
    }
    async members(p) {
        const rows = await this.memberships.inClub(p.clubId);
        return rows.map((m) => ({ membershipId: m.id, userId: m.userId, displayName: m.user.displayName, email: m.user.email, role: m.role }));
    }
};
ClubsService = __decorate([
    Injectable(),
    __param(0, InjectRepository(Club)),
    __metadata("design:paramtypes", [Repository,
        MembershipsService])
], ClubsService);
export { ClubsService };
export function toClubDto(c) {
    return {
        id: c.id, name: c.name, timeZone: c.timeZone, latitude: c.latitude, longitude: c.longitude,
        pressureUnit: c.pressureUnit, windUnit: c.windUnit, awardCheck: c.awardCheck,
    };
}
//# sourceMappingURL=clubs.service.js.map