import { Module } from '@nestjs/common';
import { ReportsController } from './reports.controller.js';
import { SeasonService } from './season.service.js';
import { ReportJobsService } from './report-jobs.service.js';

/** The Season report: its figures, and a PDF of them made by a background job. */
@Module({
  controllers: [ReportsController],
  providers: [SeasonService, ReportJobsService],
})
export class ReportsModule {}
