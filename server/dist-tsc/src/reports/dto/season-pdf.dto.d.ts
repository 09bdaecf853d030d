export declare class SeasonPdfDto {
    from: string;
    to: string;
}
export interface ReportJobDto {
    id: string;
    state: 'queued' | 'working' | 'done' | 'failed';
    error?: string;
    from: string;
    to: string;
    createdAt: string;
    finishedAt: string | null;
}
