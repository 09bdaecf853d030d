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
/** That a lapsing award was announced, so each award's expiry date is mailed about once. */
let AwardReminder = class AwardReminder {
    id;
    clubId;
    /** The member card (its id is the membership's). */
    cardId;
    awardId;
    expiresOn;
    createdAt;
};
__decorate([
    PrimaryGeneratedColumn('uuid'),
    __metadata("design:type", String)
], AwardReminder.prototype, "id", void 0);
__decorate([
    Column({ name: 'club_id', type: 'uuid' }),
    __metadata("design:type", String)
], AwardReminder.prototype, "clubId", void 0);
__decorate([
    Column({ name: 'card_id', type: 'uuid' }),
    __metadata("design:type", String)
], AwardReminder.prototype, "cardId", void 0);
__decorate([
    Column({ name: 'award_id', type: 'text' }),
    __metadata("design:type", String)
], AwardReminder.prototype, "awardId", void 0);
__decorate([
    Column({ name: 'expires_on', type: 'text' }),
    __metadata("design:type", String)
], AwardReminder.prototype, "expiresOn", void 0);
__decorate([
    CreateDateColumn({ name: 'created_at', type: 'timestamptz' }),
    __metadata("design:type", Date)
], AwardReminder.prototype, "createdAt", void 0);
AwardReminder = __decorate([
    Entity('award_reminders'),
    Index('ux_award_reminders', ['clubId', 'cardId', 'awardId', 'expiresOn'], { unique: true })
], AwardReminder);
export { AwardReminder };
//# sourceMappingURL=award-reminder.entity.js.map