import type { SeasonReportDto } from './season.types.js';
export declare const hours: (h: number) => string;
/** The season report for the club's committee: the same figures as the desk's charts, as tables. */
export declare function renderSeasonPdf(r: SeasonReportDto): Promise<Buffer>;
