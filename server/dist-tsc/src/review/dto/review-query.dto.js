var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min } from 'class-validator';
const blankIsAbsent = () => Transform(({ value }) => (typeof value === 'string' && value.trim() === '' ? undefined : typeof value === 'string' ? value.trim() : value));
const DATE = /^\d{4}-\d{2}-\d{2}$/;
export const MAX_PAGE_SIZE = 200;
/** Filters, order and page of a Review desk table; every filter is optional. */
export class ReviewQueryDto {
    from;
    to;
    boatId;
    motorId;
    memberId;
    state;
    severity;
    type;
    sort;
    dir;
    page;
    pageSize;
}
__decorate([
    ApiPropertyOptional({ description: 'First local date at the club, inclusive (YYYY-MM-DD).' }),
    IsOptional(),
    blankIsAbsent(),
    Matches(DATE, { message: 'from must be a date such as 2026-11-01.' }),
    __metadata("design:type", String)
], ReviewQueryDto.prototype, "from", void 0);
__decorate([
    ApiPropertyOptional({ description: 'Last local date at the club, inclusive (YYYY-MM-DD).' }),
    IsOptional(),
    blankIsAbsent(),
    Matches(DATE, { message: 'to must be a date such as 2026-11-30.' }),
    __metadata("design:type", String)
], ReviewQueryDto.prototype, "to", void 0);
__decorate([
    ApiPropertyOptional(),
    IsOptional(),
    blankIsAbsent(),
    IsUUID('all', { message: 'boatId must be a boat\'s id.' }),
    __metadata("design:type", String)
], ReviewQueryDto.prototype, "boatId", void 0);
__decorate([
    ApiPropertyOptional(),
    IsOptional(),
    blankIsAbsent(),
    IsUUID('all', { message: 'motorId must be a motor\'s id.' }),
    __metadata("design:type", String)
], ReviewQueryDto.prototype, "motorId", void 0);
__decorate([
    ApiPropertyOptional({ description: 'A member id (user id): records they did, wrote, drove or crewed, or were assigned.' }),
    IsOptional(),
    blankIsAbsent(),
    IsString(),
    MaxLength(64, { message: 'memberId must be a member id.' }),
    __metadata("design:type", String)
], ReviewQueryDto.prototype, "memberId", void 0);
__decorate([
    ApiPropertyOptional(),
    IsOptional(),
    blankIsAbsent(),
    IsString(),
    MaxLength(40),
    __metadata("design:type", String)
], ReviewQueryDto.prototype, "state", void 0);
__decorate([
    ApiPropertyOptional({ description: 'Defects only: stand-down, limit or note.' }),
    IsOptional(),
    blankIsAbsent(),
    IsString(),
    MaxLength(40),
    __metadata("design:type", String)
], ReviewQueryDto.prototype, "severity", void 0);
__decorate([
    ApiPropertyOptional({ description: 'Check type (checks), purpose (trips) or kind (incident notes).' }),
    IsOptional(),
    blankIsAbsent(),
    IsString(),
    MaxLength(40),
    __metadata("design:type", String)
], ReviewQueryDto.prototype, "type", void 0);
__decorate([
    ApiPropertyOptional(),
    IsOptional(),
    blankIsAbsent(),
    Matches(/^[A-Za-z]{1,40}$/, { message: 'sort must be a field name such as startedAt.' }),
    __metadata("design:type", String)
], ReviewQueryDto.prototype, "sort", void 0);
__decorate([
    ApiPropertyOptional({ enum: ['asc', 'desc'] }),
    IsOptional(),
    blankIsAbsent(),
    IsIn(['asc', 'desc'], { message: 'dir must be asc or desc.' }),
    __metadata("design:type", String)
], ReviewQueryDto.prototype, "dir", void 0);
__decorate([
    ApiPropertyOptional({ default: 0 }),
    IsOptional(),
    blankIsAbsent(),
    Type(() => Number),
    IsInt({ message: 'page must be a whole number from 0.' }),
    Min(0, { message: 'page must be a whole number from 0.' }),
    __metadata("design:type", Number)
], ReviewQueryDto.prototype, "page", void 0);
__decorate([
    ApiPropertyOptional({ default: 50, maximum: MAX_PAGE_SIZE }),
    IsOptional(),
    blankIsAbsent(),
    Type(() => Number),
    IsInt({ message: `pageSize must be a whole number from 1 to ${MAX_PAGE_SIZE}.` }),
    Min(1, { message: `pageSize must be a whole number from 1 to ${MAX_PAGE_SIZE}.` }),
    Max(MAX_PAGE_SIZE, { message: `pageSize must be a whole number from 1 to ${MAX_PAGE_SIZE}.` }),
    __metadata("design:type", Number)
], ReviewQueryDto.prototype, "pageSize", void 0);
//# sourceMappingURL=review-query.dto.js.map