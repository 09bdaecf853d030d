/**
 * The change log: every accepted change of a club, numbered by a per-club sequence given out
 * under the club's lock, so sequence order is commit order and a pull can never skip a row.
 * It doubles as each record's version history.
 */
export declare class Change {
    clubId: string;
    seq: string;
    kind: string;
    recordId: string;
    version: number;
    mutationId: string | null;
    deviceId: string;
    userId: string;
    hlc: string;
    /** The values this change wrote (after merging), for the record's history. */
    patch: Record<string, unknown>;
    deleted: boolean;
    status: string;
    createdAt: Date;
}
