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
import { HybridClock, settleConflict, } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import { recordStore } from '../records/record-store.js';
import { writeChanges } from './change-log.js';
import { lockClub } from './club-lock.js';
import { assertProtocol, toAppError } from './sync-errors.js';
import { conflictFromRow } from './conflict-rows.js';
/** Conflicts a supervisor reads and settles; a settlement is a normal change every phone pulls. */
let ConflictsService = class ConflictsService {
    db;
    clock = new HybridClock('server');
    constructor(db) {
        this.db = db;
    }
    async list(p, status = 'open') {
        const rows = await this.db.query(`SELECT * FROM sync_conflicts WHERE club_id = $1 AND ($2 = 'all' OR status = $2) ORDER BY created_at, id LIMIT 500`, [p.clubId, status]);
        return rows.map(conflictFromRow);
    }
    async openCount(p) {
        const [row] = await this.db.query(`SELECT count(*)::int AS n FROM sync_conflicts WHERE club_id = $1 AND status = 'open'`, [p.clubId]);
        return row.n;
    }
    async settle(p, conflictId, body) {
        assertProtocol(body);
        return this.db.transaction(async (em) => {
            const locked = await lockClub(em, p.clubId);
            const [row] = await em.query('SELECT * FROM sync_conflicts WHERE id = $1 AND club_id = $2', [conflictId, p.clubId]);
            if (!row)
                throw new AppError(404, 'not_found', 'That conflict does not exist in your club.');
            const conflict = conflictFromRow(row);
            const [record] = await recordStore.loadMany(em, conflict.kind, [conflict.recordId]);
            const club = {
                records: record && record.clubId === p.clubId ? { [record.id]: record } : {},
                changeSeq: locked.lastSeq, deviceSeq: {}, conflicts: [conflict], purgedThrough: locked.purgedThroughSeq,
            };
            let settled;
            try {
                settled = settleConflict({ club, auth: { userId: p.userId, role: p.role, clubId: p.clubId }, pt: Date.now(), clock: this.clock }, { ...body, conflictId });
            }
            catch (e) {
                throw toAppError(e);
            }
            await this.persist(em, p, club, locked.lastSeq, settled);
            return settled;
        });
    }
    async persist(em, p, club, startSeq, settled) {
        const rec = club.records[settled.recordId];
        if (rec && rec.changeSeq > startSeq) {
            const field = settled.field.split('.')[0];
            await writeChanges(em, p.clubId, new Map([[rec.kind, [rec]]]), [{
                    seq: rec.changeSeq, kind: rec.kind, recordId: rec.id, version: rec.version, mutationId: null, deviceId: 'server',
                    userId: p.userId, hlc: rec.hlc, patch: field === 'deleted' ? {} : { [field]: rec.fields[field] }, deleted: rec.deleted, status: 'settled',
                }], club.changeSeq);
        }
        await em.query(`UPDATE sync_conflicts SET status = 'settled', settled_by = $2, settled_at = $3, settled_value = $4::jsonb, note = $5 WHERE id = $1`, [settled.id, p.userId, settled.settledAt, JSON.stringify(settled.settledValue ?? null), settled.note ?? null]);
    }
};
ConflictsService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource])
], ConflictsService);
export { ConflictsService };
//# sourceMappingURL=conflicts.service.js.map