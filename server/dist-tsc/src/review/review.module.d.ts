/** The Review desk's server half: paged tables of merged records, their CSV, and each record's versions. */
export declare class ReviewModule {
}
