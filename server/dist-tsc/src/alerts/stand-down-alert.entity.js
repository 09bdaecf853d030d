var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
/**
 * A defect that has just begun to stand its boat down, written by a database trigger in the same
 * transaction as the defect, so no sync path can store one without its alert. The alert service
 * turns each into e-mails to the club's supervisors and marks it sent.
 */
let StandDownAlert = class StandDownAlert {
    id;
    clubId;
    defectId;
    /** The defect's version that stood the boat down. */
    defectVersion;
    createdAt;
    sentAt;
    /** How many people were mailed; 0 when mail is off or the club has no supervisor. */
    recipients;
};
__decorate([
    PrimaryGeneratedColumn('uuid'),
    __metadata("design:type", String)
], StandDownAlert.prototype, "id", void 0);
__decorate([
    Column({ name: 'club_id', type: 'uuid' }),
    __metadata("design:type", String)
], StandDownAlert.prototype, "clubId", void 0);
__decorate([
    Column({ name: 'defect_id', type: 'uuid' }),
    __metadata("design:type", String)
], StandDownAlert.prototype, "defectId", void 0);
__decorate([
    Column({ name: 'defect_version', type: 'int' }),
    __metadata("design:type", Number)
], StandDownAlert.prototype, "defectVersion", void 0);
__decorate([
    CreateDateColumn({ name: 'created_at', type: 'timestamptz' }),
    __metadata("design:type", Date)
], StandDownAlert.prototype, "createdAt", void 0);
__decorate([
    Column({ name: 'sent_at', type: 'timestamptz', nullable: true }),
    __metadata("design:type", Object)
], StandDownAlert.prototype, "sentAt", void 0);
__decorate([
    Column({ type: 'int', nullable: true }),
    __metadata("design:type", Object)
], StandDownAlert.prototype, "recipients", void 0);
StandDownAlert = __decorate([
    Entity('stand_down_alerts'),
    Index('ix_stand_down_alerts_unsent', ['createdAt'], { where: 'sent_at IS NULL' })
], StandDownAlert);
export { StandDownAlert };
//# sourceMappingURL=stand-down-alert.entity.js.map