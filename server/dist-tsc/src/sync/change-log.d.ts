import type { EntityManager } from 'typeorm';
import type { ConflictRecord, RecordKind, StoredRecord } from '@breakline/sync-protocol';
export interface ChangeEntry {
    seq: number;
    kind: string;
    recordId: string;
    version: number;
    mutationId: string | null;
    deviceId: string;
    userId: string;
    hlc: string;
    patch: Record<string, unknown>;
    deleted: boolean;
    status: string;
}
/**
 * Writes a batch in one statement: each kind's records upserted and the changes appended to the
 * log, as data-modifying parts of one WITH, and the club's change counter moved to `lastSeq`.
 * One statement is one trip to the database and one plan, however many kinds the batch touches.
 */
export declare function writeChanges(em: EntityManager, clubId: string, records: Map<RecordKind, StoredRecord[]>, entries: ChangeEntry[], lastSeq: number): Promise<void>;
/** Stores the conflicts a batch raised, in one statement. */
export declare function insertConflicts(em: EntityManager, conflicts: ConflictRecord[]): Promise<void>;
