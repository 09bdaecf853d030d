var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional, IsString, Matches, MaxLength, MinLength } from 'class-validator';
import { ROLES } from '@breakline/sync-protocol';
import { EmailField, LinkTokenField } from './fields.js';
export class CreateInviteDto {
    email;
    role;
}
__decorate([
    EmailField(),
    __metadata("design:type", String)
], CreateInviteDto.prototype, "email", void 0);
__decorate([
    ApiProperty({ enum: ROLES }),
    IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}.` }),
    __metadata("design:type", String)
], CreateInviteDto.prototype, "role", void 0);
export class AcceptInviteDto {
    token;
    displayName;
    password;
}
__decorate([
    LinkTokenField(),
    __metadata("design:type", String)
], AcceptInviteDto.prototype, "token", void 0);
__decorate([
    ApiPropertyOptional({ description: 'Needed for a new account; ignored when the address already has one.' }),
    IsOptional(),
    Transform(({ value }) => (typeof value === 'string' ? value.trim() : value)),
    MaxLength(120, { message: 'A name is at most 120 characters.' }),
    Matches(/\S/, { message: 'Enter the name other members will see.' }),
    IsString({ message: 'Enter the name other members will see.' }),
    __metadata("design:type", String)
], AcceptInviteDto.prototype, "displayName", void 0);
__decorate([
    ApiProperty({ description: 'A new password (at least 10 characters), or the existing account\'s password.' }),
    MaxLength(200, { message: 'A password is at most 200 characters.' }),
    MinLength(1, { message: 'Enter a password.' }),
    IsString({ message: 'Enter a password.' }),
    __metadata("design:type", String)
], AcceptInviteDto.prototype, "password", void 0);
//# sourceMappingURL=invite.dto.js.map