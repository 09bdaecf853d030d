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
import { Controller, Get, Param, ParseUUIDPipe, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import Papa from 'papaparse';
import { AppError } from '../common/app-error.js';
import { CurrentPrincipal } from '../auth/principal.js';
import { isReviewTable, REVIEW_TABLES } from './review-tables.js';
import { ReviewService } from './review.service.js';
import { HistoryService } from './history.service.js';
import { csvCells, csvHeader } from './review-csv.js';
import { ReviewQueryDto } from './dto/review-query.dto.js';
const FILE_STEM = { checks: 'checks', trips: 'trips', defects: 'defects', incidentNotes: 'incident-notes' };
function tableOrThrow(name) {
    if (!isReviewTable(name))
        throw new AppError(404, 'not_found', `There is no desk table "${name}"; the tables are ${REVIEW_TABLES.join(', ')}.`);
    return name;
}
let ReviewController = class ReviewController {
    review;
    histories;
    constructor(review, histories) {
        this.review = review;
        this.histories = histories;
    }
    /** The whole filtered table as CSV, in the table's order, with a header row. Declared first so ".csv" is not read as a table name. */
    async csv(p, name, q, res) {
        const table = tableOrThrow(name);
        const stem = [FILE_STEM[table], q.from, q.to].filter(Boolean).join('-');
        let started = false;
        const start = () => {
            if (started)
                return;
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
                if (!res.write(chunk))
                    await new Promise((resolve) => res.once('drain', resolve));
            });
        }
        catch (e) {
            // Before the first byte the error is an ordinary answer; after it, the download is cut short.
            if (!started)
                throw e;
            res.destroy(e);
            return;
        }
        start();
        res.end();
    }
    /** A page of a desk table: GET /api/review/checks?from=&to=&boatId=&motorId=&memberId=&state=&severity=&type=&sort=&dir=&page=&pageSize= */
    page(p, name, q) {
        return this.review.page(p, tableOrThrow(name), q);
    }
    /** Every version of a record, oldest first. */
    history(p, kind, id) {
        return this.histories.history(p, kind, id);
    }
};
__decorate([
    Get('review/:table.csv'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('table')),
    __param(2, Query()),
    __param(3, Res()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String, ReviewQueryDto, Object]),
    __metadata("design:returntype", Promise)
], ReviewController.prototype, "csv", null);
__decorate([
    Get('review/:table'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('table')),
    __param(2, Query()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String, ReviewQueryDto]),
    __metadata("design:returntype", Promise)
], ReviewController.prototype, "page", null);
__decorate([
    Get('records/:kind/:id/history'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('kind')),
    __param(2, Param('id', ParseUUIDPipe)),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String, String]),
    __metadata("design:returntype", Promise)
], ReviewController.prototype, "history", null);
ReviewController = __decorate([
    ApiTags('review'),
    ApiBearerAuth(),
    Controller(),
    __metadata("design:paramtypes", [ReviewService, HistoryService])
], ReviewController);
export { ReviewController };
//# sourceMappingURL=review.controller.js.map