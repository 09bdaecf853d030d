import type { Response } from 'express';
import { type Principal } from '../auth/principal.js';
import { ReviewService, type ReviewPage } from './review.service.js';
import { HistoryService, type HistoryDto } from './history.service.js';
import { ReviewQueryDto } from './dto/review-query.dto.js';
export declare class ReviewController {
    private readonly review;
    private readonly histories;
    constructor(review: ReviewService, histories: HistoryService);
    /** The whole filtered table as CSV, in the table's order, with a header row. Declared first so ".csv" is not read as a table name. */
    csv(p: Principal, name: string, q: ReviewQueryDto, res: Response): Promise<void>;
    /** A page of a desk table: GET /api/review/checks?from=&to=&boatId=&motorId=&memberId=&state=&severity=&type=&sort=&dir=&page=&pageSize= */
    page(p: Principal, name: string, q: ReviewQueryDto): Promise<ReviewPage>;
    /** Every version of a record, oldest first. */
    history(p: Principal, kind: string, id: string): Promise<HistoryDto>;
}
