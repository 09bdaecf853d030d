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
import { DataSource } from 'typeorm';
import { AppError } from '../common/app-error.js';
/** Roles per club, changed by an admin; a club always keeps at least one admin. */
let MemberRolesService = class MemberRolesService {
    db;
    constructor(db) {
        this.db = db;
    }
    async change(p, membershipId, role) {
        return this.db.transaction(async (em) => {
            // The club's admins and the target are locked in one statement, in id order, so two admins
            // demoting each other at once cannot both succeed (or deadlock).
            const locked = await em.query(`SELECT id, role FROM memberships WHERE club_id = $1 AND (role = 'admin' OR id = $2) ORDER BY id FOR UPDATE`, [p.clubId, membershipId]);
            const target = locked.find((m) => m.id === membershipId);
            if (!target)
                throw new AppError(404, 'not_found', 'There is no such member in your club.');
            if (target.role === 'admin' && role !== 'admin' && locked.filter((m) => m.role === 'admin').length <= 1) {
                throw new AppError(409, 'conflict', 'This is the club\'s only admin. Make another member an admin first.');
            }
            if (target.role !== role)
                await em.query('UPDATE memberships SET role = $3 WHERE id = $1 AND club_id = $2', [membershipId, p.clubId, role]);
            const [row] = await em.query(`SELECT m.id, m.user_id, m.role, u.display_name, u.email FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.id = $1`, [membershipId]);
            return { membershipId: row.id, userId: row.user_id, displayName: row.display_name, email: row.email, role: row.role };
        });
    }
};
MemberRolesService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource])
], MemberRolesService);
export { MemberRolesService };
//# sourceMappingURL=member-roles.service.js.map