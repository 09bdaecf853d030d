export type ReportJobState = 'queued' | 'working' | 'done' | 'failed';
/** A report asked for and made in the background; the finished PDF is kept with it for a while. */
export declare class ReportJob {
    id: string;
    clubId: string;
    requestedBy: string;
    /** Local dates at the club, inclusive. */
    fromDate: string;
    toDate: string;
    state: ReportJobState;
    error: string | null;
    file: Buffer | null;
    createdAt: Date;
    finishedAt: Date | null;
}
