var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable, Logger } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
import { recordStore } from '../records/record-store.js';
import { lockClub } from './club-lock.js';
const DAY = 86_400_000;
/**
 * Deleted records stay as tombstones for TOMBSTONE_RETENTION_DAYS, longer than any phone stays
 * offline, then go. A phone whose checkpoint is older than what was purged must pull afresh.
 */
let TombstonesService = class TombstonesService {
    db;
    env;
    log = new Logger('Tombstones');
    timer;
    constructor(db, env) {
        this.db = db;
        this.env = env;
    }
    onApplicationBootstrap() {
        if (this.env.NODE_ENV === 'test')
            return;
        this.timer = setInterval(() => this.purgeAll().catch((e) => this.log.error(e)), DAY);
        this.timer.unref();
    }
    onModuleDestroy() {
        clearInterval(this.timer);
    }
    async purgeAll(now = new Date()) {
        const clubs = await this.db.query('SELECT club_id FROM sync_club_state');
        let total = 0;
        for (const { club_id } of clubs)
            total += await this.purgeClub(club_id, now);
        return total;
    }
    /** Purges one club's old tombstones under the club's lock, and moves its horizon on. */
    async purgeClub(clubId, now = new Date()) {
        const before = new Date(now.getTime() - this.env.TOMBSTONE_RETENTION_DAYS * DAY);
        return this.db.transaction(async (em) => {
            await lockClub(em, clubId);
            const { highest, count } = await recordStore.purgeTombstones(em, clubId, before);
            if (highest > 0) {
                await em.query('UPDATE sync_club_state SET purged_through_seq = GREATEST(purged_through_seq, $2) WHERE club_id = $1', [clubId, highest]);
            }
            return count;
        });
    }
};
TombstonesService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource, Env])
], TombstonesService);
export { TombstonesService };
//# sourceMappingURL=tombstones.service.js.map