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
/** A report asked for and made in the background; the finished PDF is kept with it for a while. */
let ReportJob = class ReportJob {
    id;
    clubId;
    requestedBy;
    /** Local dates at the club, inclusive. */
    fromDate;
    toDate;
    state;
    error;
    file;
    createdAt;
    finishedAt;
};
__decorate([
    PrimaryGeneratedColumn('uuid'),
    __metadata("design:type", String)
], ReportJob.prototype, "id", void 0);
__decorate([
    Column({ name: 'club_id', type: 'uuid' }),
    __metadata("design:type", String)
], ReportJob.prototype, "clubId", void 0);
__decorate([
    Column({ name: 'requested_by', type: 'uuid' }),
    __metadata("design:type", String)
], ReportJob.prototype, "requestedBy", void 0);
__decorate([
    Column({ name: 'from_date', type: 'text' }),
    __metadata("design:type", String)
], ReportJob.prototype, "fromDate", void 0);
__decorate([
    Column({ name: 'to_date', type: 'text' }),
    __metadata("design:type", String)
], ReportJob.prototype, "toDate", void 0);
__decorate([
    Column({ type: 'text', default: 'queued' }),
    __metadata("design:type", String)
], ReportJob.prototype, "state", void 0);
__decorate([
    Column({ type: 'text', nullable: true }),
    __metadata("design:type", Object)
], ReportJob.prototype, "error", void 0);
__decorate([
    Column({ type: 'bytea', nullable: true, select: false }),
    __metadata("design:type", Object)
], ReportJob.prototype, "file", void 0);
__decorate([
    CreateDateColumn({ name: 'created_at', type: 'timestamptz' }),
    __metadata("design:type", Date)
], ReportJob.prototype, "createdAt", void 0);
__decorate([
    Column({ name: 'finished_at', type: 'timestamptz', nullable: true }),
    __metadata("design:type", Object)
], ReportJob.prototype, "finishedAt", void 0);
ReportJob = __decorate([
    Entity('report_jobs'),
    Index('ix_report_jobs_club', ['clubId', 'createdAt'])
], ReportJob);
export { ReportJob };
//# sourceMappingURL=report-job.entity.js.map