import { type OnApplicationBootstrap } from '@nestjs/common';
import { DataSource } from 'typeorm';
import type { Principal } from '../auth/principal.js';
import { JobsService } from '../jobs/jobs.service.js';
import { SeasonService } from './season.service.js';
import type { ReportJobDto } from './dto/season-pdf.dto.js';
/** Season PDFs made by a background job: ask, poll the job's state, fetch the file. */
export declare class ReportJobsService implements OnApplicationBootstrap {
    private readonly db;
    private readonly jobs;
    private readonly season;
    private readonly log;
    constructor(db: DataSource, jobs: JobsService, season: SeasonService);
    onApplicationBootstrap(): Promise<void>;
    request(p: Principal, fromDate: string, toDate: string): Promise<ReportJobDto>;
    get(p: Principal, id: string): Promise<ReportJobDto>;
    file(p: Principal, id: string): Promise<{
        name: string;
        bytes: Buffer;
    }>;
    private find;
    /** The job: works out the figures and writes the PDF; the last failed try records why. */
    private make;
    private cleanup;
}
