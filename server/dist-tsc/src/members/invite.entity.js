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
 * An invitation to join a club by e-mail. Only a SHA-256 of the link's secret is kept; the link
 * works once, until it expires or a newer invitation to the same address replaces it.
 */
let Invite = class Invite {
    id;
    clubId;
    /** Lower-cased, like users.email. */
    email;
    role;
    secretHash;
    invitedBy;
    expiresAt;
    acceptedAt;
    acceptedBy;
    /** Withdrawn by an admin or replaced by a newer invitation. */
    revokedAt;
    createdAt;
};
__decorate([
    PrimaryGeneratedColumn('uuid'),
    __metadata("design:type", String)
], Invite.prototype, "id", void 0);
__decorate([
    Column({ name: 'club_id', type: 'uuid' }),
    __metadata("design:type", String)
], Invite.prototype, "clubId", void 0);
__decorate([
    Column({ type: 'text' }),
    __metadata("design:type", String)
], Invite.prototype, "email", void 0);
__decorate([
    Column({ type: 'text' }),
    __metadata("design:type", String)
], Invite.prototype, "role", void 0);
__decorate([
    Column({ name: 'secret_hash', type: 'text' }),
    __metadata("design:type", String)
], Invite.prototype, "secretHash", void 0);
__decorate([
    Column({ name: 'invited_by', type: 'uuid' }),
    __metadata("design:type", String)
], Invite.prototype, "invitedBy", void 0);
__decorate([
    Column({ name: 'expires_at', type: 'timestamptz' }),
    __metadata("design:type", Date)
], Invite.prototype, "expiresAt", void 0);
__decorate([
    Column({ name: 'accepted_at', type: 'timestamptz', nullable: true }),
    __metadata("design:type", Object)
], Invite.prototype, "acceptedAt", void 0);
__decorate([
    Column({ name: 'accepted_by', type: 'uuid', nullable: true }),
    __metadata("design:type", Object)
], Invite.prototype, "acceptedBy", void 0);
__decorate([
    Column({ name: 'revoked_at', type: 'timestamptz', nullable: true }),
    __metadata("design:type", Object)
], Invite.prototype, "revokedAt", void 0);
__decorate([
    CreateDateColumn({ name: 'created_at', type: 'timestamptz' }),
    __metadata("design:type", Date)
], Invite.prototype, "createdAt", void 0);
Invite = __decorate([
    Entity('invites'),
    Index('ix_invites_club', ['clubId', 'createdAt']),
    Index('ix_invites_club_email', ['clubId', 'email'])
], Invite);
export { Invite };
//# sourceMappingURL=invite.entity.js.map