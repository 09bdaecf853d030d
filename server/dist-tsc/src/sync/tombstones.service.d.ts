import { type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
/**
 * Deleted records stay as tombstones for TOMBSTONE_RETENTION_DAYS, longer than any phone stays
 * offline, then go. A phone whose checkpoint is older than what was purged must pull afresh.
 */
export declare class TombstonesService implements OnApplicationBootstrap, OnModuleDestroy {
    private readonly db;
    private readonly env;
    private readonly log;
    private timer?;
    constructor(db: DataSource, env: Env);
    onApplicationBootstrap(): void;
    onModuleDestroy(): void;
    purgeAll(now?: Date): Promise<number>;
    /** Purges one club's old tombstones under the club's lock, and moves its horizon on. */
    purgeClub(clubId: string, now?: Date): Promise<number>;
}
