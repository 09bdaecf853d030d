import { type RecordKind } from '@breakline/sync-protocol';
/** The SQL type a kind's field is stored as, read from its schema in sync-protocol. */
export type SqlType = 'text' | 'double precision' | 'boolean' | 'jsonb';
/** `optional`: absent when not set (stored as NULL, read back as absent); `nullable`: may be null. */
export interface FieldColumn {
    field: string;
    column: string;
    type: SqlType;
    nullable: boolean;
    optional: boolean;
}
export declare const snake: (s: string) => string;
/** Table of a kind: defect → defects, checkTemplate → check_templates. */
export declare const tableOf: (kind: RecordKind) => string;
/** The kind's own fields as columns, in schema order. */
export declare function fieldColumns(kind: RecordKind): FieldColumn[];
export declare const ALL_KINDS: readonly RecordKind[];
