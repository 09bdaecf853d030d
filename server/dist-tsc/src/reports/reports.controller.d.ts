import type { Response } from 'express';
import { type Principal } from '../auth/principal.js';
import { SeasonService } from './season.service.js';
import { ReportJobsService } from './report-jobs.service.js';
import type { SeasonReportDto } from './season.types.js';
import { SeasonPdfDto, type ReportJobDto } from './dto/season-pdf.dto.js';
export declare class ReportsController {
    private readonly season;
    private readonly reports;
    constructor(season: SeasonService, reports: ReportJobsService);
    /** The season's figures: GET /api/reports/season?from=2026-09-01&to=2027-04-30 (local dates, inclusive). */
    figures(p: Principal, from?: string, to?: string): Promise<SeasonReportDto>;
    /** Starts the PDF; answers at once with the job to poll. */
    pdf(p: Principal, dto: SeasonPdfDto): Promise<ReportJobDto & {
        jobId: string;
    }>;
    job(p: Principal, id: string): Promise<ReportJobDto>;
    file(p: Principal, id: string, res: Response): Promise<void>;
}
