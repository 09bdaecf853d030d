var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable, Logger } from '@nestjs/common';
import PgBoss from 'pg-boss';
import { Env } from '../config/env.js';
/**
 * The PostgreSQL-backed job queue (pg-boss). Queues are declared with their retry policy and
 * handler; a job can be sent inside a TypeORM transaction so it exists exactly when the rows
 * that asked for it commit.
 */
let JobsService = class JobsService {
    log = new Logger('Jobs');
    boss;
    ready;
    markReady;
    failStart;
    workers = new Map();
    stopped = false;
    constructor(env) {
        this.boss = new PgBoss({ connectionString: env.DATABASE_URL, schema: 'pgboss', max: 4, application_name: 'breakline-jobs' });
        this.boss.on('error', (e) => this.log.error(`Job queue: ${e.message}`));
        this.ready = new Promise((resolve, reject) => { this.markReady = resolve; this.failStart = reject; });
        // Declarations made before start wait on this; a failed start is reported by onModuleInit.
        this.ready.catch(() => undefined);
    }
    async onModuleInit() {
        try {
            await this.boss.start();
            this.markReady();
        }
        catch (e) {
            this.failStart(e);
            throw new Error(`The job queue could not start: ${e.message}`);
        }
    }
    async onApplicationShutdown() {
        if (this.stopped)
            return;
        this.stopped = true;
        // Running jobs finish (or are retried later by another server); no new ones are taken.
        await this.boss.stop({ graceful: true, wait: true, timeout: 15_000 }).catch((e) => this.log.warn(`Job queue stop: ${e.message}`));
    }
    /** Creates the queue if needed and starts this server's worker for it. */
    async define(name, options, handler) {
        await this.declare(name, options);
        const id = await this.boss.work(name, { includeMetadata: true, pollingIntervalSeconds: 2 }, async ([job]) => {
            if (!job)
                return;
            try {
                await handler(job.data, { id: job.id, retryCount: job.retryCount, retryLimit: job.retryLimit });
            }
            finally {
                // A worker otherwise waits a polling interval after each job: with a backlog (an alert to
                // ten supervisors) it takes the next one at once instead.
                this.nudge(name);
            }
        });
        this.workers.set(name, id);
    }
    /** Creates the queue, or brings an existing one's retry policy up to these settings. */
    async declare(name, options) {
        await this.ready;
        const queue = { name, retryLimit: options.retryLimit, retryDelay: options.retryDelay, retryBackoff: options.retryBackoff ?? true, expireInSeconds: options.expireInSeconds ?? 300 };
        // createQueue leaves an existing queue as it was, so changed settings need the update.
        await this.boss.createQueue(name, queue);
        await this.boss.updateQueue(name, queue);
    }
    /**
     * Queues a job. With `em` the job is written in that transaction and runs once it commits;
     * call `nudge` after the commit to start it without waiting for the next poll.
     */
    async send(name, data, opts = {}) {
        await this.ready;
        const db = opts.em ? transactionDb(opts.em) : undefined;
        const id = await this.boss.send(name, data, { ...(db ? { db } : {}), ...(opts.singletonKey ? { singletonKey: opts.singletonKey } : {}) });
        if (!opts.em)
            this.nudge(name);
        return id;
    }
    /** Wakes this server's worker for the queue at once. */
    nudge(name) {
        const worker = this.workers.get(name);
        if (worker)
            this.boss.notifyWorker(worker);
    }
    /** Runs a queue on a cron schedule (UTC); one server of many sends each run. */
    async schedule(name, cron) {
        await this.ready;
        await this.boss.schedule(name, cron, {}, { tz: 'UTC' });
    }
    async state(name, id) {
        await this.ready;
        return this.boss.getJobById(name, id, { includeArchive: true });
    }
};
JobsService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [Env])
], JobsService);
export { JobsService };
/** pg-boss's database hook, running its statements on the caller's transaction. */
function transactionDb(em) {
    const runner = em.queryRunner;
    if (!runner)
        throw new Error('A job sent inside a transaction needs the transaction\'s entity manager.');
    return { executeSql: async (text, values) => ({ rows: (await runner.query(text, values, true)).records }) };
}
//# sourceMappingURL=jobs.service.js.map