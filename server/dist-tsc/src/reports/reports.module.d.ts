/** The Season report: its figures, and a PDF of them made by a background job. */
export declare class ReportsModule {
}
