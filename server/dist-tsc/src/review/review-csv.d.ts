import type { ReviewTable } from './review-tables.js';
import type { ReviewRow } from './review.service.js';
type Cell = string | number | boolean | null;
type Column = [header: string, value: (r: ReviewRow, zone: string) => Cell];
/** Each table's columns, in the order a person reads them; the record id last, to find it again. */
export declare const CSV_COLUMNS: Record<ReviewTable, Column[]>;
export declare const csvHeader: (t: ReviewTable) => string[];
export declare const csvCells: (t: ReviewTable, r: ReviewRow, zone: string) => Cell[];
export {};
