var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Column, Entity, PrimaryColumn } from 'typeorm';
/** One row a club: its change counter (locked per push) and the tombstone purge horizon. */
let ClubSyncState = class ClubSyncState {
    clubId;
    lastSeq;
    /** Tombstones up to this sequence are gone: a checkpoint below it must pull afresh. */
    purgedThroughSeq;
};
__decorate([
    PrimaryColumn({ name: 'club_id', type: 'uuid' }),
    __metadata("design:type", String)
], ClubSyncState.prototype, "clubId", void 0);
__decorate([
    Column({ name: 'last_seq', type: 'bigint', default: 0 }),
    __metadata("design:type", String)
], ClubSyncState.prototype, "lastSeq", void 0);
__decorate([
    Column({ name: 'purged_through_seq', type: 'bigint', default: 0 }),
    __metadata("design:type", String)
], ClubSyncState.prototype, "purgedThroughSeq", void 0);
ClubSyncState = __decorate([
    Entity('sync_club_state')
], ClubSyncState);
export { ClubSyncState };
//# sourceMappingURL=club-sync-state.entity.js.map