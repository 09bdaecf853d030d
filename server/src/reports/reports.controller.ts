import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentPrincipal, MinRole, type Principal } from '../auth/principal.js';
import { SeasonService } from './season.service.js';
import { ReportJobsService } from './report-jobs.service.js';
import type { SeasonReportDto } from './season.types.js';
import { SeasonPdfDto, type ReportJobDto } from './dto/season-pdf.dto.js';

@ApiTags('reports')
@ApiBearerAuth()
@Controller('reports')
@MinRole('supervisor')
export class ReportsController {
  constructor(private readonly season: SeasonService, private readonly reports: ReportJobsService) {}

  /** The season's figures: GET /api/reports/season?from=2026-09-01&to=2027-04-30 (local dates, inclusive). */
  @Get('season')
  figures(@CurrentPrincipal() p: Principal, @Query('from') from?: string, @Query('to') to?: string): Promise<SeasonReportDto> {
    return this.season.figures(p.clubId, from, to);
  }

  /** Starts the PDF; answers at once with the job to poll. */
  @Post('season/pdf')
  @HttpCode(202)
  async pdf(@CurrentPrincipal() p: Principal, @Body() dto: SeasonPdfDto): Promise<ReportJobDto & { jobId: string }> {
    const job = await this.reports.request(p, dto.from, dto.to);
    return { jobId: job.id, ...job };
  }

  @Get('jobs/:id')
  job(@CurrentPrincipal() p: Principal, @Param('id', ParseUUIDPipe) id: string): Promise<ReportJobDto> {
    return this.reports.get(p, id);
  }

  @Get('jobs/:id/file')
  async file(@CurrentPrincipal() p: Principal, @Param('id', ParseUUIDPipe) id: string, @Res() res: Response): Promise<void> {
    const { name, bytes } = await this.reports.file(p, id);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `attachment; filename="${name}"`);
    res.setHeader('Cache-Control', 'no-store');
    res.end(bytes);
  }
}
