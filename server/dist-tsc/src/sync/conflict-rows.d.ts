import type { ConflictRecord } from '@breakline/sync-protocol';
export type ConflictRow = Record<string, any>;
export declare function conflictFromRow(r: ConflictRow): ConflictRecord;
