import type { EntityManager } from 'typeorm';
import type { RecordKind, StoredRecord } from '@breakline/sync-protocol';
/** Kind-table reads and writes as single multi-row statements, never one entity at a time. */
export declare const recordStore: {
    /**
     * Records of one kind with these ids, of any club: the caller refuses ids that belong to
     * another club. No row lock is needed: the push holds its club's lock, and only pushes and
     * settlements of that club write these rows.
     */
    loadMany(em: EntityManager, kind: RecordKind, ids: string[]): Promise<StoredRecord[]>;
    /**
     * Inserts or replaces records in one statement through json_to_recordset. The rows go as json,
     * not jsonb: jsonb input builds (and sorts the keys of) a binary copy of every row only to take
     * it apart again; json took about two thirds of the time for a 10,000-record push.
     */
    upsertMany(em: EntityManager, kind: RecordKind, records: StoredRecord[]): Promise<void>;
    /**
     * The upsert of upsertMany as SQL, its inputs appended to `params`, so that a caller can run it
     * as one part of a larger statement (the push writes records and change log in one).
     */
    upsertInto(kind: RecordKind, records: StoredRecord[], params: unknown[]): string;
    /**
     * The club's records changed after `since`, oldest change first, at most `limit` + 1 (the extra
     * one tells whether there is more). Each kind's (club_id, change_seq) index is scanned for at
     * most limit + 1 rows, so the cost follows the page size, not the history.
     */
    changedAfter(em: EntityManager, clubId: string, since: number, limit: number): Promise<StoredRecord[]>;
    /** Drops tombstones older than `before`; returns how many and the highest change seq removed. */
    purgeTombstones(em: EntityManager, clubId: string, before: Date): Promise<{
        highest: number;
        count: number;
    }>;
};
