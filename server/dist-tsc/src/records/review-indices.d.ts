import type { RecordKind } from '@breakline/sync-protocol';
/**
 * Indexes for the Review desk's tables and the season report: a club's records by the time the
 * desk filters and sorts on, alone and per boat. Property names are the kinds' field names.
 */
export declare const REVIEW_INDICES: Partial<Record<RecordKind, {
    name: string;
    columns: string[];
}[]>>;
