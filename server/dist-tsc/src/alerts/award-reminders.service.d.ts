import { type OnApplicationBootstrap } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { JobsService } from '../jobs/jobs.service.js';
import { MailService } from '../mail/mail.service.js';
import { type LapsingAward } from './alert-texts.js';
/**
 * Once a day: each award on a member card that has entered its last 30 days (sync-protocol's
 * "lapsing") is mailed about once, to its holder and, in one list a club, to the supervisors and
 * admins. A day missed is caught up the next day, since "lapsing" lasts the whole 30 days.
 */
export declare class AwardRemindersService implements OnApplicationBootstrap {
    private readonly db;
    private readonly jobs;
    private readonly mail;
    constructor(db: DataSource, jobs: JobsService, mail: MailService);
    onApplicationBootstrap(): Promise<void>;
    /** Mails what has newly begun to lapse; returns the awards announced. */
    run(now?: Date): Promise<LapsingAward[]>;
    private runClub;
}
