/** One row a club: its change counter (locked per push) and the tombstone purge horizon. */
export declare class ClubSyncState {
    clubId: string;
    lastSeq: string;
    /** Tombstones up to this sequence are gone: a checkpoint below it must pull afresh. */
    purgedThroughSeq: string;
}
