var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
var __param = (this && this.__param) || function (paramIndex, decorator) {
    return function (target, key) { decorator(target, key, paramIndex); }
};
import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole } from '../auth/principal.js';
import { SeasonService } from './season.service.js';
import { ReportJobsService } from './report-jobs.service.js';
import { SeasonPdfDto } from './dto/season-pdf.dto.js';
let ReportsController = class ReportsController {
    season;
    reports;
    constructor(season, reports) {
        this.season = season;
        this.reports = reports;
    }
    /** The season's figures: GET /api/reports/season?from=2026-09-01&to=2027-04-30 (local dates, inclusive). */
    figures(p, from, to) {
        return this.season.figures(p.clubId, from, to);
    }
    /** Starts the PDF; answers at once with the job to poll. */
    async pdf(p, dto) {
        const job = await this.reports.request(p, dto.from, dto.to);
        return { jobId: job.id, ...job };
    }
    job(p, id) {
        return this.reports.get(p, id);
    }
    async file(p, id, res) {
        const { name, bytes } = await this.reports.file(p, id);
        res.setHeader('Content-Type', 'application/pdf');
        res.setHeader('Content-Disposition', `attachment; filename="${name}"`);
        res.setHeader('Cache-Control', 'no-store');
        res.end(bytes);
    }
};
__decorate([
    Get('season'),
    __param(0, CurrentPrincipal()),
    __param(1, Query('from')),
    __param(2, Query('to')),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String, String]),
    __metadata("design:returntype", Promise)
], ReportsController.prototype, "figures", null);
__decorate([
    Post('season/pdf'),
    HttpCode(202),
    __param(0, CurrentPrincipal()),
    __param(1, Body()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, SeasonPdfDto]),
    __metadata("design:returntype", Promise)
], ReportsController.prototype, "pdf", null);
__decorate([
    Get('jobs/:id'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('id', ParseUUIDPipe)),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String]),
    __metadata("design:returntype", Promise)
], ReportsController.prototype, "job", null);
__decorate([
    Get('jobs/:id/file'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('id', ParseUUIDPipe)),
    __param(2, Res()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String, Object]),
    __metadata("design:returntype", Promise)
], ReportsController.prototype, "file", null);
ReportsController = __decorate([
    ApiTags('reports'),
    ApiBearerAuth(),
    Controller('reports'),
    MinRole('supervisor'),
    __metadata("design:paramtypes", [SeasonService, ReportJobsService])
], ReportsController);
export { ReportsController };
//# sourceMappingURL=reports.controller.js.map