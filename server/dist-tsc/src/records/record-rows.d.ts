import type { RecordKind, StoredRecord } from '@breakline/sync-protocol';
import type { InputColumn } from './batch-input.js';
/** A row of a kind table as PostgreSQL returns it (snake_case columns). */
export type Row = Record<string, unknown>;
/** Row → the record shape the shared sync rules work on. */
export declare function rowToRecord(kind: RecordKind, row: Row): StoredRecord;
type Column = InputColumn<StoredRecord>;
/** Record → the columns of its kind table, for writing records in bulk (see batchInput). */
export declare function recordColumns(kind: RecordKind): Column[];
export {};
