/** A phone or tablet's last accepted mutation seq, written in the same transaction as its changes. */
export declare class SyncDevice {
    clubId: string;
    deviceId: string;
    lastSeq: number;
    lastUserId: string | null;
    lastPushAt: Date | null;
}
