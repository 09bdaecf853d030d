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
/** A phone or tablet's last accepted mutation seq, written in the same transaction as its changes. */
let SyncDevice = class SyncDevice {
    clubId;
    deviceId;
    lastSeq;
    lastUserId;
    lastPushAt;
};
__decorate([
    PrimaryColumn({ name: 'club_id', type: 'uuid' }),
    __metadata("design:type", String)
], SyncDevice.prototype, "clubId", void 0);
__decorate([
    PrimaryColumn({ name: 'device_id', type: 'text' }),
    __metadata("design:type", String)
], SyncDevice.prototype, "deviceId", void 0);
__decorate([
    Column({ name: 'last_seq', type: 'int', default: 0 }),
    __metadata("design:type", Number)
], SyncDevice.prototype, "lastSeq", void 0);
__decorate([
    Column({ name: 'last_user_id', type: 'uuid', nullable: true }),
    __metadata("design:type", Object)
], SyncDevice.prototype, "lastUserId", void 0);
__decorate([
    Column({ name: 'last_push_at', type: 'timestamptz', nullable: true }),
    __metadata("design:type", Object)
], SyncDevice.prototype, "lastPushAt", void 0);
SyncDevice = __decorate([
    Entity('sync_devices')
], SyncDevice);
export { SyncDevice };
//# sourceMappingURL=device.entity.js.map