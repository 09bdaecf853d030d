import { DataSource } from 'typeorm';
import type { Principal } from '../auth/principal.js';
import { type ReviewTable } from './review-tables.js';
import type { ReviewQueryDto } from './dto/review-query.dto.js';
/** One row of a desk table: the record's fields, flat, with the names a person reads beside the ids. */
export type ReviewRow = {
    id: string;
    version: number;
    updatedAt: string;
} & Record<string, unknown>;
export interface ReviewPage {
    rows: ReviewRow[];
    total: number;
    page: number;
    pageSize: number;
}
/** The desk's tables: a club's records of one kind, filtered, sorted and paged by the database. */
export declare class ReviewService {
    private readonly db;
    constructor(db: DataSource);
    page(p: Principal, table: ReviewTable, q: ReviewQueryDto): Promise<ReviewPage>;
    /**
     * Every matching row, in the table's order, a batch at a time, read from one snapshot so rows
     * written meanwhile neither repeat nor go missing between batches.
     */
    eachBatch(p: Principal, table: ReviewTable, q: ReviewQueryDto, onBatch: (rows: ReviewRow[], zone: string) => Promise<void>, size?: number): Promise<void>;
    zoneOf(clubId: string): Promise<string>;
    private plan;
}
