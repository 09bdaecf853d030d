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
/** Two values for one field; the automatic rule kept one, a supervisor settles it. */
let SyncConflict = class SyncConflict {
    id;
    clubId;
    recordId;
    kind;
    field;
    keptValue;
    overruledValue;
    kept;
    overruled;
    status;
    createdAt;
    settledBy;
    settledAt;
    settledValue;
    note;
};
__decorate([
    PrimaryColumn({ type: 'uuid' }),
    __metadata("design:type", String)
], SyncConflict.prototype, "id", void 0);
__decorate([
    Column({ name: 'club_id', type: 'uuid' }),
    __metadata("design:type", String)
], SyncConflict.prototype, "clubId", void 0);
__decorate([
    Column({ name: 'record_id', type: 'uuid' }),
    __metadata("design:type", String)
], SyncConflict.prototype, "recordId", void 0);
__decorate([
    Column({ type: 'text' }),
    __metadata("design:type", String)
], SyncConflict.prototype, "kind", void 0);
__decorate([
    Column({ type: 'text' }),
    __metadata("design:type", String)
], SyncConflict.prototype, "field", void 0);
__decorate([
    Column({ name: 'kept_value', type: 'jsonb', nullable: true }),
    __metadata("design:type", Object)
], SyncConflict.prototype, "keptValue", void 0);
__decorate([
    Column({ name: 'overruled_value', type: 'jsonb', nullable: true }),
    __metadata("design:type", Object)
], SyncConflict.prototype, "overruledValue", void 0);
__decorate([
    Column({ type: 'jsonb' }),
    __metadata("design:type", Object)
], SyncConflict.prototype, "kept", void 0);
__decorate([
    Column({ type: 'jsonb' }),
    __metadata("design:type", Object)
], SyncConflict.prototype, "overruled", void 0);
__decorate([
    Column({ type: 'text', default: 'open' }),
    __metadata("design:type", String)
], SyncConflict.prototype, "status", void 0);
__decorate([
    Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' }),
    __metadata("design:type", Date)
], SyncConflict.prototype, "createdAt", void 0);
__decorate([
    Column({ name: 'settled_by', type: 'uuid', nullable: true }),
    __metadata("design:type", Object)
], SyncConflict.prototype, "settledBy", void 0);
__decorate([
    Column({ name: 'settled_at', type: 'timestamptz', nullable: true }),
    __metadata("design:type", Object)
], SyncConflict.prototype, "settledAt", void 0);
__decorate([
    Column({ name: 'settled_value', type: 'jsonb', nullable: true }),
    __metadata("design:type", Object)
], SyncConflict.prototype, "settledValue", void 0);
__decorate([
    Column({ type: 'text', nullable: true }),
    __metadata("design:type", Object)
], SyncConflict.prototype, "note", void 0);
SyncConflict = __decorate([
    Entity('sync_conflicts'),
    Index('ix_sync_conflicts_open', ['clubId', 'status', 'createdAt'])
], SyncConflict);
export { SyncConflict };
//# sourceMappingURL=conflict.entity.js.map