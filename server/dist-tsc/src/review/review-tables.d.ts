import { type RecordKind } from '@breakline/sync-protocol';
/** The Review desk's tables, as they appear in the address: /api/review/checks, /api/review/trips ... */
export declare const REVIEW_TABLES: readonly ["checks", "trips", "defects", "incidentNotes"];
export type ReviewTable = (typeof REVIEW_TABLES)[number];
export declare const isReviewTable: (s: string) => s is ReviewTable;
/**
 * A member-id column as a uuid, or null when it does not hold one, so a join on it can use the
 * primary key and an odd value can never fail the query.
 */
export declare const uid: (expr: string) => string;
/** Name a person field's display name goes under: performedBy → performedByName, driverId → driverName. */
export declare const nameKey: (field: string) => string;
export interface TableSpec {
    kind: RecordKind;
    /** Label in messages. */
    words: string;
    /** The time field the date range and the default order use. */
    date: string;
    hasBoat: boolean;
    hasMotor: boolean;
    /** Fields holding one member id; each gets a display name. */
    people: string[];
    /** SQL matching the memberId filter ($M is its parameter). */
    member: string;
    /** The state filter's values and what each means. */
    states: Record<string, string>;
    /** The type filter: which field, and its values. */
    type?: {
        field: string;
        values: readonly string[];
    };
    severity: boolean;
    /** Computed values each row carries, by name. */
    extras: Record<string, string>;
    /** Sort keys (field names, as the rows carry them) and the SQL each sorts by. */
    sorts: Record<string, string>;
}
export declare const personAlias: (i: number) => string;
export declare const TABLES: Record<ReviewTable, TableSpec>;
export declare const tableName: (t: ReviewTable) => string;
