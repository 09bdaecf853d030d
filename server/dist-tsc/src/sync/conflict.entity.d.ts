export interface ConflictSideRow {
    deviceId: string;
    userId: string;
    hlc: string;
}
/** Two values for one field; the automatic rule kept one, a supervisor settles it. */
export declare class SyncConflict {
    id: string;
    clubId: string;
    recordId: string;
    kind: string;
    field: string;
    keptValue: unknown;
    overruledValue: unknown;
    kept: ConflictSideRow;
    overruled: ConflictSideRow;
    status: 'open' | 'settled';
    createdAt: Date;
    settledBy: string | null;
    settledAt: Date | null;
    settledValue: unknown;
    note: string | null;
}
