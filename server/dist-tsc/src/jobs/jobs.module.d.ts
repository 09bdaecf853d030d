/** The job queue, shared by every module that sends or works jobs. */
export declare class JobsModule {
}
