import { Controller, Get, Param, ParseUUIDPipe, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import Papa from 'papaparse';
import { AppError } from '../common/app-error.js';
import { CurrentPrincipal, type Principal } from '../auth/principal.js';
import { isReviewTable, REVIEW_TABLES, type ReviewTable } from './review-tables.js';
import { ReviewService, type ReviewPage } from './review.service.js';
import { HistoryService, type HistoryDto } from './history.service.js';
import { csvCells, csvHeader } from './review-csv.js';
import { ReviewQueryDto } from './dto/review-query.dto.js';

const FILE_STEM: Record<ReviewTable, string> = { checks: 'checks', trips: 'trips', defects: 'defects', incidentNotes: 'incident-notes' };

function tableOrThrow(name: string): ReviewTable {
  if (!isReviewTable(name)) throw new AppError(404, 'not_found', `There is no desk table "${name}"; the tables are ${REVIEW_TABLES.join(', ')}.`);
  return name;
}

@ApiTags('review')
@ApiBearerAuth()
@Controller()
export class ReviewController {
  constructor(private readonly review: ReviewService, private readonly histories: HistoryService) {}

  /** The whole filtered table as CSV, in the table's order, with a header row. Declared first so ".csv" is not read as a table name. */
  @Get('review/:table.csv')
  async csv(@CurrentPrincipal() p: Principal, @Param('table') name: string, @Query() q: ReviewQueryDto, @Res() res: Response): Promise<void> {
    const table = tableOrThrow(name);
    const stem = [FILE_STEM[table], q.from, q.to].filter(Boolean).join('-');
    let started = false;
    const start = () => {
      if (started) return;
      started = true;
      res.status(200);
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Content-Disposition', `attachment; filename="${stem}.csv"`);
      res.setHeader('Cache-Control', 'no-store');
      res.write(Papa.unparse([csvHeader(table)], { newline: '\r\n' }) + '\r\n');
    };
    try {
      await this.review.eachBatch(p, table, q, async (rows, zone) => {
        start();
        // escapeFormulae: a cell a spreadsheet would run as a formula is written as text.
        const chunk = Papa.unparse(rows.map((r) => csvCells(table, r, zone)), { newline: '\r\n', escapeFormulae: true }) + '\r\n';
        if (!res.write(chunk)) await new Promise((resolve) => res.once('drain', resolve));
      });
    } catch (e) {
      // Before the first byte the error is an ordinary answer; after it, the download is cut short.
      if (!started) throw e;
      res.destroy(e as Error);
      return;
    }
    start();
    res.end();
  }

  /** A page of a desk table: GET /api/review/checks?from=&to=&boatId=&motorId=&memberId=&state=&severity=&type=&sort=&dir=&page=&pageSize= */
  @Get('review/:table')
  page(@CurrentPrincipal() p: Principal, @Param('table') name: string, @Query() q: ReviewQueryDto): Promise<ReviewPage> {
    return this.review.page(p, tableOrThrow(name), q);
  }

  /** Every version of a record, oldest first. */
  @Get('records/:kind/:id/history')
  history(@CurrentPrincipal() p: Principal, @Param('kind') kind: string, @Param('id', ParseUUIDPipe) id: string): Promise<HistoryDto> {
    return this.histories.history(p, kind, id);
  }
}
