var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { ApiProperty } from '@nestjs/swagger';
import { IsString, IsUUID, MaxLength, MinLength } from 'class-validator';
export class RefreshDto {
    refreshToken;
}
__decorate([
    ApiProperty(),
    IsString({ message: 'refreshToken is required.' }),
    MinLength(10, { message: 'refreshToken is not a refresh token.' }),
    MaxLength(200),
    __metadata("design:type", String)
], RefreshDto.prototype, "refreshToken", void 0);
export class SwitchClubDto extends RefreshDto {
    clubId;
}
__decorate([
    ApiProperty(),
    IsUUID('all', { message: 'clubId must be a club id.' }),
    __metadata("design:type", String)
], SwitchClubDto.prototype, "clubId", void 0);
//# sourceMappingURL=refresh.dto.js.map