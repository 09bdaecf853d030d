export declare const MAX_PAGE_SIZE = 200;
/** Filters, order and page of a Review desk table; every filter is optional. */
export declare class ReviewQueryDto {
    from?: string;
    to?: string;
    boatId?: string;
    motorId?: string;
    memberId?: string;
    state?: string;
    severity?: string;
    type?: string;
    sort?: string;
    dir?: 'asc' | 'desc';
    page?: number;
    pageSize?: number;
}
