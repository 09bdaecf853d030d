import { DataSource } from 'typeorm';
import { type ConflictRecord } from '@breakline/sync-protocol';
import type { Principal } from '../auth/principal.js';
/** Conflicts a supervisor reads and settles; a settlement is a normal change every phone pulls. */
export declare class ConflictsService {
    private readonly db;
    private readonly clock;
    constructor(db: DataSource);
    list(p: Principal, status?: 'open' | 'settled' | 'all'): Promise<ConflictRecord[]>;
    openCount(p: Principal): Promise<number>;
    settle(p: Principal, conflictId: string, body: Record<string, unknown>): Promise<ConflictRecord>;
    private persist;
}
