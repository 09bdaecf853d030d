import { DataSource } from 'typeorm';
import type { SeasonReportDto } from './season.types.js';
/** The longest range one report covers; a longer one is two reports. */
export declare const MAX_REPORT_DAYS = 731;
/** Monday (ISO 8601 week start) of a local date; day 0 of the day count, 1970-01-01, was a Thursday. */
export declare function weekOf(date: string): string;
export declare function checkRange(from: string | undefined, to: string | undefined): {
    from: string;
    to: string;
};
/**
 * Season figures from the club's trips, incident notes and defects, computed by the same shared
 * rules (sync-protocol) the phones use. Trips count in the week and range of their launch,
 * incidents of when they happened, defects of when they were reported.
 */
export declare class SeasonService {
    private readonly db;
    constructor(db: DataSource);
    figures(clubId: string, fromDate: string | undefined, toDate: string | undefined, now?: Date): Promise<SeasonReportDto>;
}
