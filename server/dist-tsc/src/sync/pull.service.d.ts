import { DataSource } from 'typeorm';
import { type PullResponse } from '@breakline/sync-protocol';
import type { Principal } from '../auth/principal.js';
/**
 * Pull: the club's records changed after a checkpoint, oldest change first, that the caller may
 * see. Checkpoints carry the purge horizon they were given under, so a fresh start below the
 * horizon goes on page after page while a replica from before the purge is sent back to the start.
 */
export declare class PullService {
    private readonly db;
    constructor(db: DataSource);
    pull(p: Principal, query: Record<string, unknown>): Promise<PullResponse>;
    private page;
}
