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
import { canSee, deepEqual, fieldLabel, isRecordKind, kindSpec } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import { recordStore } from '../records/record-store.js';
/** A record's versions from the change log: who, when, from which device, and what each changed. */
let HistoryService = class HistoryService {
    db;
    constructor(db) {
        this.db = db;
    }
    async history(p, kind, id) {
        if (!isRecordKind(kind))
            throw new AppError(404, 'not_found', `There is no record kind "${kind}".`);
        const [rec] = await recordStore.loadMany(this.db.manager, kind, [id]);
        // Another club's record answers exactly like a missing one.
        if (!rec || rec.clubId !== p.clubId)
            throw new AppError(404, 'not_found', `There is no such ${kindSpec(kind).label.replace(/^an? /, '')} in your club.`);
        if (!canSee(kind, p.role, rec.fields, p.userId))
            throw new AppError(403, 'forbidden', `You do not have access to this ${kindSpec(kind).label.replace(/^an? /, '')}.`);
        const rows = await this.db.query(`SELECT c.version, c.hlc, c.created_at, c.user_id, u.display_name, c.device_id, c.status, c.patch, c.deleted
       FROM sync_changes c
       LEFT JOIN memberships m ON m.club_id = c.club_id AND m.user_id = c.user_id
       LEFT JOIN users u ON u.id = m.user_id
       WHERE c.club_id = $1 AND c.record_id = $2 ORDER BY c.seq`, [p.clubId, id]);
        const state = {};
        let deleted = false;
        const versions = rows.map((r) => {
            const changes = {};
            for (const [field, to] of Object.entries(r.patch ?? {})) {
                const from = state[field] ?? null;
                if (!deepEqual(from, to))
                    changes[field] = { from, to, label: fieldLabel([field]) };
                state[field] = to;
            }
            if (r.deleted !== deleted)
                changes.deleted = { from: deleted, to: r.deleted, label: 'deleted' };
            deleted = r.deleted;
            return {
                version: r.version, hlc: r.hlc, at: new Date(r.created_at).toISOString(), user: { id: r.user_id, name: r.display_name },
                deviceId: r.device_id, status: r.status, deleted: r.deleted, changes,
            };
        });
        return { kind, id, versions };
    }
};
HistoryService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource])
], HistoryService);
export { HistoryService };
//# sourceMappingURL=history.service.js.map