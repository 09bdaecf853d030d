var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
export const PRESSURE_UNITS = ['kPa', 'psi', 'bar', 'mbar'];
export const WIND_UNITS = ['kn', 'km/h', 'm/s'];
/** What sign-on does for a member without a current award for the role: warn, or refuse. */
export const AWARD_CHECKS = ['warn', 'block'];
/** A surf lifesaving club: the tenant every club-owned row points to. */
let Club = class Club {
    id;
    name;
    slug;
    /** IANA time-zone name, e.g. Australia/Sydney. */
    timeZone;
    /** WGS 84 degrees of the patrolled beach, for daylight warnings. */
    latitude;
    longitude;
    pressureUnit;
    windUnit;
    awardCheck;
    createdAt;
};
__decorate([
    PrimaryGeneratedColumn('uuid'),
    __metadata("design:type", String)
], Club.prototype, "id", void 0);
__decorate([
    Column({ type: 'text' }),
    __metadata("design:type", String)
], Club.prototype, "name", void 0);
__decorate([
    Column({ type: 'text', unique: true }),
    __metadata("design:type", String)
], Club.prototype, "slug", void 0);
__decorate([
    Column({ name: 'time_zone', type: 'text' }),
    __metadata("design:type", String)
], Club.prototype, "timeZone", void 0);
__decorate([
    Column({ type: 'double precision' }),
    __metadata("design:type", Number)
], Club.prototype, "latitude", void 0);
__decorate([
    Column({ type: 'double precision' }),
    __metadata("design:type", Number)
], Club.prototype, "longitude", void 0);
__decorate([
    Column({ name: 'pressure_unit', type: 'text', default: 'kPa' }),
    __metadata("design:type", String)
], Club.prototype, "pressureUnit", void 0);
__decorate([
    Column({ name: 'wind_unit', type: 'text', default: 'kn' }),
    __metadata("design:type", String)
], Club.prototype, "windUnit", void 0);
__decorate([
    Column({ name: 'award_check', type: 'text', default: 'warn' }),
    __metadata("design:type", String)
], Club.prototype, "awardCheck", void 0);
__decorate([
    CreateDateColumn({ name: 'created_at', type: 'timestamptz' }),
    __metadata("design:type", Date)
], Club.prototype, "createdAt", void 0);
Club = __decorate([
    Entity('clubs')
], Club);
export { Club };
//# sourceMappingURL=club.entity.js.map