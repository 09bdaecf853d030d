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
import { applyMutation, deepEqual, HybridClock, parsePushRequest, } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import { recordStore } from '../records/record-store.js';
import { insertConflicts, writeChanges } from './change-log.js';
import { lockClub, lockDevice, saveClubSeq, saveDeviceSeq } from './club-lock.js';
import { assertProtocol } from './sync-errors.js';
const NOT_FOUND = 'This record is not on the server, so the change could not be saved.';
/**
 * Push: one transaction a batch. The club's records that the batch touches are loaded in one
 * query a kind, every mutation is checked and merged by the same rules the phones' tests use
 * (sync-protocol), and the records, their change log and the club's counter are written back in
 * one statement.
 */
let PushService = class PushService {
    db;
    clock = new HybridClock('server');
    constructor(db) {
        this.db = db;
    }
    async push(p, body) {
        assertProtocol(body);
        const parsed = parsePushRequest(body);
        if (!parsed.success) {
            const details = parsed.error.issues.map((i) => ({ field: i.path.join('.') || 'body', message: i.message }));
            throw new AppError(400, 'validation_failed', 'The push is not in the sync format.', details);
        }
        const { deviceId, mutations } = parsed.data;
        return this.db.transaction((em) => this.pushInTransaction(em, p, deviceId, mutations));
    }
    async pushInTransaction(em, p, deviceId, mutations) {
        const locked = await lockClub(em, p.clubId);
        const deviceSeq = await lockDevice(em, p.clubId, deviceId);
        // Duplicates are loaded too, so their answer carries the record's current version.
        const { records, foreign } = await this.loadTouched(em, p.clubId, mutations);
        const club = { records, changeSeq: locked.lastSeq, deviceSeq: { [deviceId]: deviceSeq }, conflicts: [], purgedThrough: locked.purgedThroughSeq };
        const auth = { userId: p.userId, role: p.role, clubId: p.clubId };
        const ctx = { club, auth, deviceId, pt: Date.now(), clock: this.clock, newId: () => crypto.randomUUID(), validated: new Map() };
        const results = [];
        const changes = [];
        for (const m of mutations) {
            if (m.seq <= (club.deviceSeq[deviceId] ?? 0)) {
                const rec = club.records[m.recordId];
                results.push({ mutationId: m.mutationId, status: 'duplicate', ...(rec ? { version: rec.version } : {}) });
                continue;
            }
            club.deviceSeq[deviceId] = m.seq;
            if (foreign.has(m.recordId)) {
                results.push({ mutationId: m.mutationId, status: 'rejected', error: { code: 'not-found', message: NOT_FOUND } });
                continue;
            }
            const before = club.records[m.recordId];
            // applyMutation replaces the record rather than changing it, so the old fields stay as they were.
            const prevFields = before?.fields ?? {};
            const prevSeq = club.changeSeq;
            const result = applyMutation(ctx, m);
            results.push(result);
            if (club.changeSeq > prevSeq)
                changes.push(changeEntry(club.records[m.recordId], prevFields, m, result));
        }
        await this.write(em, p.clubId, club, locked.lastSeq, changes);
        await saveDeviceSeq(em, p.clubId, deviceId, club.deviceSeq[deviceId] ?? deviceSeq, p.userId);
        return { results, lastSeq: club.deviceSeq[deviceId] ?? deviceSeq };
    }
    /** The club's current records that the batch names; ids that belong to another club are set apart. */
    async loadTouched(em, clubId, mutations) {
        const byKind = new Map();
        for (const m of mutations)
            (byKind.get(m.kind) ?? byKind.set(m.kind, new Set()).get(m.kind)).add(m.recordId);
        const records = {};
        const foreign = new Set();
        for (const [kind, ids] of byKind) {
            for (const r of await recordStore.loadMany(em, kind, [...ids])) {
                if (r.clubId === clubId)
                    records[r.id] = r;
                else
                    foreign.add(r.id);
            }
        }
        return { records, foreign };
    }
    async write(em, clubId, club, startSeq, changes) {
        if (club.changeSeq === startSeq && !club.conflicts.length)
            return;
        const changed = new Map();
        for (const r of Object.values(club.records)) {
            if (r.changeSeq > startSeq)
                (changed.get(r.kind) ?? changed.set(r.kind, []).get(r.kind)).push(r);
        }
        if (changes.length)
            await writeChanges(em, clubId, changed, changes, club.changeSeq);
        else
            await saveClubSeq(em, clubId, club.changeSeq);
        await insertConflicts(em, club.conflicts);
    }
};
PushService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource])
], PushService);
export { PushService };
/** What one accepted mutation wrote, for the change log and the record's history. */
function changeEntry(rec, prev, m, result) {
    const patch = {};
    for (const k in rec.fields)
        if (!deepEqual(prev[k], rec.fields[k]))
            patch[k] = rec.fields[k];
    return {
        seq: rec.changeSeq, kind: rec.kind, recordId: rec.id, version: rec.version, mutationId: m.mutationId,
        deviceId: rec.lastActor.deviceId, userId: rec.lastActor.userId, hlc: m.hlc, patch, deleted: rec.deleted, status: result.status,
    };
}
//# sourceMappingURL=push.service.js.map