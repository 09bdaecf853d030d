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
/** A mailed link to set a new password: only a SHA-256 of its secret is kept; it works once. */
let PasswordReset = class PasswordReset {
    id;
    userId;
    secretHash;
    expiresAt;
    /** Set when the link is used, or when a newer link replaces it. */
    usedAt;
    createdAt;
};
__decorate([
    PrimaryGeneratedColumn('uuid'),
    __metadata("design:type", String)
], PasswordReset.prototype, "id", void 0);
__decorate([
    Index('ix_password_resets_user'),
    Column({ name: 'user_id', type: 'uuid' }),
    __metadata("design:type", String)
], PasswordReset.prototype, "userId", void 0);
__decorate([
    Column({ name: 'secret_hash', type: 'text' }),
    __metadata("design:type", String)
], PasswordReset.prototype, "secretHash", void 0);
__decorate([
    Column({ name: 'expires_at', type: 'timestamptz' }),
    __metadata("design:type", Date)
], PasswordReset.prototype, "expiresAt", void 0);
__decorate([
    Column({ name: 'used_at', type: 'timestamptz', nullable: true }),
    __metadata("design:type", Object)
], PasswordReset.prototype, "usedAt", void 0);
__decorate([
    CreateDateColumn({ name: 'created_at', type: 'timestamptz' }),
    __metadata("design:type", Date)
], PasswordReset.prototype, "createdAt", void 0);
PasswordReset = __decorate([
    Entity('password_resets')
], PasswordReset);
export { PasswordReset };
//# sourceMappingURL=password-reset.entity.js.map