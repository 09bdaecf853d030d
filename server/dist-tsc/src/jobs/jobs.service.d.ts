import { type OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';
import { Env } from '../config/env.js';
/** What a queue's handler is told about the job besides its data. */
export interface JobInfo {
    id: string;
    retryCount: number;
    retryLimit: number;
}
export interface QueueOptions {
    /** Tries after the first; pg-boss waits retryDelay seconds, doubling each time when backoff is on. */
    retryLimit: number;
    retryDelay: number;
    retryBackoff?: boolean;
    /** Longest a single try may run before it counts as failed. */
    expireInSeconds?: number;
}
type Handler<T> = (data: T, info: JobInfo) => Promise<void>;
/**
 * The PostgreSQL-backed job queue (pg-boss). Queues are declared with their retry policy and
 * handler; a job can be sent inside a TypeORM transaction so it exists exactly when the rows
 * that asked for it commit.
 */
export declare class JobsService implements OnModuleInit, OnApplicationShutdown {
    private readonly log;
    private readonly boss;
    private readonly ready;
    private markReady;
    private failStart;
    private readonly workers;
    private stopped;
    constructor(env: Env);
    onModuleInit(): Promise<void>;
    onApplicationShutdown(): Promise<void>;
    /** Creates the queue if needed and starts this server's worker for it. */
    define<T extends object>(name: string, options: QueueOptions, handler: Handler<T>): Promise<void>;
    /** Creates the queue, or brings an existing one's retry policy up to these settings. */
    declare(name: string, options: QueueOptions): Promise<void>;
    /**
     * Queues a job. With `em` the job is written in that transaction and runs once it commits;
     * call `nudge` after the commit to start it without waiting for the next poll.
     */
    send(name: string, data: object, opts?: {
        em?: EntityManager;
        singletonKey?: string;
    }): Promise<string | null>;
    /** Wakes this server's worker for the queue at once. */
    nudge(name: string): void;
    /** Runs a queue on a cron schedule (UTC); one server of many sends each run. */
    schedule(name: string, cron: string): Promise<void>;
    state(name: string, id: string): Promise<PgBoss.JobWithMetadata<unknown> | null>;
}
export {};
