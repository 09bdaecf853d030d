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
import { IsEmail, IsOptional, IsString, IsUUID, MaxLength, MinLength } from 'class-validator';
export class LoginDto {
    email;
    password;
    clubId;
}
__decorate([
    ApiProperty({ example: 'member@example.org' }),
    Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value)),
    MaxLength(254, { message: 'An e-mail address is at most 254 characters.' }),
    IsEmail({}, { message: 'Enter an e-mail address such as name@example.org.' }),
    __metadata("design:type", String)
], LoginDto.prototype, "email", void 0);
__decorate([
    ApiProperty()
    // class-validator runs the lowest decorator first; stopAtFirstError keeps one message a field.
    ,
    MaxLength(200, { message: 'A password is at most 200 characters.' }),
    MinLength(1, { message: 'Enter your password.' }),
    IsString({ message: 'Enter your password.' }),
    __metadata("design:type", String)
], LoginDto.prototype, "password", void 0);
__decorate([
    ApiPropertyOptional({ description: 'Club to sign in to, when the person belongs to several.' }),
    IsOptional(),
    IsUUID('all', { message: 'clubId must be a club id.' }),
    __metadata("design:type", String)
], LoginDto.prototype, "clubId", void 0);
//# sourceMappingURL=login.dto.js.map