var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Club } from './club.entity.js';
import { User } from '../users/user.entity.js';
/** A person's role in one club. The active club of a request always comes from here. */
let Membership = class Membership {
    id;
    clubId;
    userId;
    role;
    club;
    user;
    createdAt;
};
__decorate([
    PrimaryGeneratedColumn('uuid'),
    __metadata("design:type", String)
], Membership.prototype, "id", void 0);
__decorate([
    Column({ name: 'club_id', type: 'uuid' }),
    __metadata("design:type", String)
], Membership.prototype, "clubId", void 0);
__decorate([
    Column({ name: 'user_id', type: 'uuid' }),
    __metadata("design:type", String)
], Membership.prototype, "userId", void 0);
__decorate([
    Column({ type: 'text' }),
    __metadata("design:type", String)
], Membership.prototype, "role", void 0);
__decorate([
    ManyToOne(() => Club, { onDelete: 'CASCADE' }),
    JoinColumn({ name: 'club_id' }),
    __metadata("design:type", Club)
], Membership.prototype, "club", void 0);
__decorate([
    ManyToOne(() => User, { onDelete: 'CASCADE' }),
    JoinColumn({ name: 'user_id' }),
    __metadata("design:type", User)
], Membership.prototype, "user", void 0);
__decorate([
    CreateDateColumn({ name: 'created_at', type: 'timestamptz' }),
    __metadata("design:type", Date)
], Membership.prototype, "createdAt", void 0);
Membership = __decorate([
    Entity('memberships'),
    Index(['clubId', 'userId'], { unique: true })
], Membership);
export { Membership };
//# sourceMappingURL=membership.entity.js.map