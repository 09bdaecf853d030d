import { type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
import { MailService } from '../mail/mail.service.js';
/**
 * E-mails a club's supervisors and admins when a defect begins to stand a boat down. The alert row
 * is written by a trigger on the defects table in the defect's own transaction (push, settlement
 * or seed alike); this service mails each unsent alert once, however many servers run.
 */
export declare class StandDownAlertsService implements OnApplicationBootstrap, OnApplicationShutdown {
    private readonly db;
    private readonly env;
    private readonly mail;
    private readonly log;
    private timer?;
    private running;
    constructor(db: DataSource, env: Env, mail: MailService);
    onApplicationBootstrap(): void;
    onApplicationShutdown(): Promise<void>;
    private tick;
    /** Mails every unsent alert; returns how many alerts were handled. */
    dispatch(): Promise<number>;
    private batch;
}
