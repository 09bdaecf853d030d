var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable, Logger } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { AppError } from '../common/app-error.js';
import { JobsService } from '../jobs/jobs.service.js';
import { ReportJob } from './report-job.entity.js';
import { checkRange, SeasonService } from './season.service.js';
import { renderSeasonPdf } from './season-pdf.js';
const PDF_QUEUE = 'reports.season-pdf';
const CLEANUP_QUEUE = 'reports.cleanup';
/** Finished reports are kept this long, then made again on request. */
const KEEP_DAYS = 14;
/** Season PDFs made by a background job: ask, poll the job's state, fetch the file. */
let ReportJobsService = class ReportJobsService {
    db;
    jobs;
    season;
    log = new Logger('Reports');
    constructor(db, jobs, season) {
        this.db = db;
        this.jobs = jobs;
        this.season = season;
    }
    async onApplicationBootstrap() {
        await this.jobs.define(PDF_QUEUE, { retryLimit: 2, retryDelay: 5, expireInSeconds: 300 }, (d, info) => this.make(d.reportId, info));
        await this.jobs.define(CLEANUP_QUEUE, { retryLimit: 1, retryDelay: 60 }, () => this.cleanup());
        await this.jobs.schedule(CLEANUP_QUEUE, '30 3 * * *');
    }
    async request(p, fromDate, toDate) {
        const { from, to } = checkRange(fromDate, toDate);
        const job = await this.db.transaction(async (em) => {
            const row = await em.save(em.create(ReportJob, { clubId: p.clubId, requestedBy: p.userId, fromDate: from, toDate: to, state: 'queued', error: null, file: null, finishedAt: null }));
            await this.jobs.send(PDF_QUEUE, { reportId: row.id }, { em });
            return row;
        });
        this.jobs.nudge(PDF_QUEUE);
        return toDto(job);
    }
    async get(p, id) {
        return toDto(await this.find(p, id));
    }
    async file(p, id) {
        const job = await this.find(p, id);
        if (job.state === 'failed')
            throw new AppError(409, 'conflict', `The report could not be made: ${job.error ?? 'unknown error'}. Ask for it again.`);
        if (job.state !== 'done')
            throw new AppError(409, 'conflict', 'The report is still being made; ask again in a few seconds.');
        const [row] = await this.db.query('SELECT file FROM report_jobs WHERE id = $1 AND club_id = $2', [id, p.clubId]);
        return { name: `season-report-${job.fromDate}-to-${job.toDate}.pdf`, bytes: row.file };
    }
    async find(p, id) {
        const job = await this.db.getRepository(ReportJob).findOneBy({ id, clubId: p.clubId });
        if (!job)
            throw new AppError(404, 'not_found', 'There is no such report in your club; reports are kept for 14 days, so ask for it again.');
        return job;
    }
    /** The job: works out the figures and writes the PDF; the last failed try records why. */
    async make(reportId, info) {
        const repo = this.db.getRepository(ReportJob);
        const job = await repo.findOneBy({ id: reportId });
        if (!job || job.state === 'done')
            return; // removed since, or already made by an earlier try
        await repo.update({ id: reportId }, { state: 'working' });
        try {
            const figures = await this.season.figures(job.clubId, job.fromDate, job.toDate);
            const bytes = await renderSeasonPdf(figures);
            await repo.update({ id: reportId }, { state: 'done', file: bytes, error: null, finishedAt: new Date() });
        }
        catch (e) {
            const message = e.message;
            const last = info.retryCount >= info.retryLimit;
            await repo.update({ id: reportId }, { state: last ? 'failed' : 'queued', error: message, ...(last ? { finishedAt: new Date() } : {}) });
            this.log.warn(`Season report ${reportId} failed on try ${info.retryCount + 1}: ${message}`);
            throw e;
        }
    }
    async cleanup() {
        await this.db.query(`DELETE FROM report_jobs WHERE created_at < now() - make_interval(days => $1)`, [KEEP_DAYS]);
    }
};
ReportJobsService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource, JobsService, SeasonService])
], ReportJobsService);
export { ReportJobsService };
function toDto(j) {
    return {
        id: j.id, state: j.state, ...(j.error && j.state === 'failed' ? { error: j.error } : {}), from: j.fromDate, to: j.toDate,
        createdAt: j.createdAt.toISOString(), finishedAt: j.finishedAt?.toISOString() ?? null,
    };
}
//# sourceMappingURL=report-jobs.service.js.map