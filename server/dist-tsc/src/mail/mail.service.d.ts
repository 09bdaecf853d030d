import { type OnApplicationBootstrap } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { Env } from '../config/env.js';
import { JobsService } from '../jobs/jobs.service.js';
import { type MailMessage } from './mail.types.js';
/**
 * Mail goes out as jobs: a request only writes the job, and a worker hands it to the SMTP server,
 * retrying with growing waits when that server is slow or down.
 */
export declare class MailService implements OnApplicationBootstrap {
    private readonly env;
    private readonly jobs;
    private readonly log;
    private transport;
    constructor(env: Env, jobs: JobsService);
    get enabled(): boolean;
    onApplicationBootstrap(): Promise<void>;
    /** Refuses a request that cannot do its job without mail, before it writes anything. */
    assertEnabled(): void;
    /** Queues a message; inside a transaction (`em`) it is sent only if that transaction commits. */
    queue(message: MailMessage, em?: EntityManager): Promise<void>;
    /** Like queue, but when mail is off the message is only logged: for alerts nobody waits on. */
    queueOrLog(message: MailMessage, em?: EntityManager): Promise<boolean>;
    /** Starts any queued mail at once, e.g. after the transaction that queued it commits. */
    nudge(): void;
    private deliver;
    private smtp;
}
