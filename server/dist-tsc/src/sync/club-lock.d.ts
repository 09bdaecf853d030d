import type { EntityManager } from 'typeorm';
export interface LockedClub {
    lastSeq: number;
    purgedThroughSeq: number;
}
/**
 * Takes the club's sync lock for the rest of the transaction. Sequence numbers are handed out
 * under it, so they commit in order; other clubs have their own rows and never wait on this one.
 */
export declare function lockClub(em: EntityManager, clubId: string): Promise<LockedClub>;
export declare function saveClubSeq(em: EntityManager, clubId: string, lastSeq: number): Promise<void>;
/** The device's last accepted seq, locked like the club (a device pushes one batch at a time). */
export declare function lockDevice(em: EntityManager, clubId: string, deviceId: string): Promise<number>;
export declare function saveDeviceSeq(em: EntityManager, clubId: string, deviceId: string, lastSeq: number, userId: string): Promise<void>;
