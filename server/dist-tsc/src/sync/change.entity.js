var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
/**
 * The change log: every accepted change of a club, numbered by a per-club sequence given out
 * under the club's lock, so sequence order is commit order and a pull can never skip a row.
 * It doubles as each record's version history.
 */
let Change = class Change {
    clubId;
    seq;
    kind;
    recordId;
    version;
    mutationId;
    deviceId;
    userId;
    hlc;
    /** The values this change wrote (after merging), for the record's history. */
    patch;
    deleted;
    status;
    createdAt;
};
__decorate([
    PrimaryColumn({ name: 'club_id', type: 'uuid' }),
    __metadata("design:type", String)
], Change.prototype, "clubId", void 0);
__decorate([
    PrimaryColumn({ type: 'bigint' }),
    __metadata("design:type", String)
], Change.prototype, "seq", void 0);
__decorate([
    Column({ type: 'text' }),
    __metadata("design:type", String)
], Change.prototype, "kind", void 0);
__decorate([
    Column({ name: 'record_id', type: 'uuid' }),
    __metadata("design:type", String)
], Change.prototype, "recordId", void 0);
__decorate([
    Column({ type: 'int' }),
    __metadata("design:type", Number)
], Change.prototype, "version", void 0);
__decorate([
    Column({ name: 'mutation_id', type: 'uuid', nullable: true }),
    __metadata("design:type", Object)
], Change.prototype, "mutationId", void 0);
__decorate([
    Column({ name: 'device_id', type: 'text' }),
    __metadata("design:type", String)
], Change.prototype, "deviceId", void 0);
__decorate([
    Column({ name: 'user_id', type: 'uuid' }),
    __metadata("design:type", String)
], Change.prototype, "userId", void 0);
__decorate([
    Column({ type: 'text' }),
    __metadata("design:type", String)
], Change.prototype, "hlc", void 0);
__decorate([
    Column({ type: 'jsonb' }),
    __metadata("design:type", Object)
], Change.prototype, "patch", void 0);
__decorate([
    Column({ type: 'boolean', default: false }),
    __metadata("design:type", Boolean)
], Change.prototype, "deleted", void 0);
__decorate([
    Column({ type: 'text' }),
    __metadata("design:type", String)
], Change.prototype, "status", void 0);
__decorate([
    Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' }),
    __metadata("design:type", Date)
], Change.prototype, "createdAt", void 0);
Change = __decorate([
    Entity('sync_changes'),
    Index('ix_sync_changes_record', ['recordId', 'version'])
], Change);
export { Change };
//# sourceMappingURL=change.entity.js.map