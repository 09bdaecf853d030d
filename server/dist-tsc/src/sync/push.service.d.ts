import { DataSource } from 'typeorm';
import { type PushResponse } from '@breakline/sync-protocol';
import type { Principal } from '../auth/principal.js';
/**
 * Push: one transaction a batch. The club's records that the batch touches are loaded in one
 * query a kind, every mutation is checked and merged by the same rules the phones' tests use
 * (sync-protocol), and the records, their change log and the club's counter are written back in
 * one statement.
 */
export declare class PushService {
    private readonly db;
    private readonly clock;
    constructor(db: DataSource);
    push(p: Principal, body: unknown): Promise<PushResponse>;
    private pushInTransaction;
    /** The club's current records that the batch names; ids that belong to another club are set apart. */
    private loadTouched;
    private write;
}
