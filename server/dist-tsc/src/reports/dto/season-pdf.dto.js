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
import { Matches } from 'class-validator';
export class SeasonPdfDto {
    from;
    to;
}
__decorate([
    ApiProperty({ example: '2026-09-01', description: 'First local date at the club, inclusive.' }),
    Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'from must be a date such as 2026-09-01.' }),
    __metadata("design:type", String)
], SeasonPdfDto.prototype, "from", void 0);
__decorate([
    ApiProperty({ example: '2027-04-30', description: 'Last local date at the club, inclusive.' }),
    Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'to must be a date such as 2027-04-30.' }),
    __metadata("design:type", String)
], SeasonPdfDto.prototype, "to", void 0);
//# sourceMappingURL=season-pdf.dto.js.map