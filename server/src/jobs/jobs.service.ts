import { Injectable, Logger, type OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';
import { Env } from '../config/env.js';

/** What a queue's handler is told about the job besides its data. */
export interface JobInfo { id: string; retryCount: number; retryLimit: number }

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
@Injectable()
export class JobsService implements OnModuleInit, OnApplicationShutdown {
  private readonly log = new Logger('Jobs');
  private readonly boss: PgBoss;
  private readonly ready: Promise<void>;
  private markReady!: () => void;
  private failStart!: (e: Error) => void;
  private readonly workers = new Map<string, string>();
  private stopped = false;

  constructor(env: Env) {
    this.boss = new PgBoss({ connectionString: env.DATABASE_URL, schema: 'pgboss', max: 4, application_name: 'breakline-jobs' });
    this.boss.on('error', (e) => this.log.error(`Job queue: ${e.message}`));
    this.ready = new Promise<void>((resolve, reject) => { this.markReady = resolve; this.failStart = reject; });
    // Declarations made before start wait on this; a failed start is reported by onModuleInit.
    this.ready.catch(() => undefined);
  }

  async onModuleInit() {
    try {
      await this.boss.start();
      this.markReady();
    } catch (e) {
      this.failStart(e as Error);
      throw new Error(`The job queue could not start: ${(e as Error).message}`);
    }
  }

  async onApplicationShutdown() {
    if (this.stopped) return;
    this.stopped = true;
    // Running jobs finish (or are retried later by another server); no new ones are taken.
    await this.boss.stop({ graceful: true, wait: true, timeout: 15_000 }).catch((e: Error) => this.log.warn(`Job queue stop: ${e.message}`));
    // The queue's stop resolves before its own worker clean-up has finished: that clean-up checks
    // every second whether each worker has stopped. Wait it out, so nothing of the queue still runs
    // once the server has closed (a test process or a reloading server would find it half torn down).
    if (this.workers.size > 0) await new Promise((resolve) => setTimeout(resolve, 1_200));
  }

  /** Creates the queue if needed and starts this server's worker for it. */
  async define<T extends object>(name: string, options: QueueOptions, handler: Handler<T>): Promise<void> {
    await this.declare(name, options);
    const id = await this.boss.work<T>(name, { includeMetadata: true, pollingIntervalSeconds: 2 }, async ([job]) => {
      if (!job) return;
      try {
        await handler(job.data, { id: job.id, retryCount: job.retryCount, retryLimit: job.retryLimit });
      } finally {
        // A worker otherwise waits a polling interval after each job: with a backlog (an alert to
        // ten supervisors) it takes the next one at once instead.
        this.nudge(name);
      }
    });
    this.workers.set(name, id);
  }

  /** Creates the queue, or brings an existing one's retry policy up to these settings. */
  async declare(name: string, options: QueueOptions): Promise<void> {
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
  async send(name: string, data: object, opts: { em?: EntityManager; singletonKey?: string } = {}): Promise<string | null> {
    await this.ready;
    const db = opts.em ? transactionDb(opts.em) : undefined;
    const id = await this.boss.send(name, data, { ...(db ? { db } : {}), ...(opts.singletonKey ? { singletonKey: opts.singletonKey } : {}) });
    if (!opts.em) this.nudge(name);
    return id;
  }

  /** Wakes this server's worker for the queue at once. */
  nudge(name: string) {
    const worker = this.workers.get(name);
    if (worker) this.boss.notifyWorker(worker);
  }

  /** Runs a queue on a cron schedule (UTC); one server of many sends each run. */
  async schedule(name: string, cron: string): Promise<void> {
    await this.ready;
    await this.boss.schedule(name, cron, {}, { tz: 'UTC' });
  }

  async state(name: string, id: string) {
    await this.ready;
    return this.boss.getJobById(name, id, { includeArchive: true });
  }
}

/** pg-boss's database hook, running its statements on the caller's transaction. */
function transactionDb(em: EntityManager): PgBoss.Db {
  const runner = em.queryRunner;
  if (!runner) throw new Error('A job sent inside a transaction needs the transaction\'s entity manager.');
  return { executeSql: async (text, values) => ({ rows: (await runner.query(text, values, true)).records }) };
}
