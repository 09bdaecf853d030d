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
import nodemailer from 'nodemailer';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
import { JobsService } from '../jobs/jobs.service.js';
import { MAIL_QUEUE } from './mail.types.js';
const NOT_SET_UP = 'E-mail is not set up on this server, so the message cannot be sent. Ask whoever runs Breakline to set SMTP_HOST.';
/**
 * Mail goes out as jobs: a request only writes the job, and a worker hands it to the SMTP server,
 * retrying with growing waits when that server is slow or down.
 */
let MailService = class MailService {
    env;
    jobs;
    log = new Logger('Mail');
    transport = null;
    constructor(env, jobs) {
        this.env = env;
        this.jobs = jobs;
    }
    get enabled() {
        return Boolean(this.env.SMTP_HOST);
    }
    async onApplicationBootstrap() {
        if (!this.enabled) {
            this.log.warn('SMTP_HOST is not set: e-mail is off (invitations cannot be sent; alerts are logged only).');
            return;
        }
        // With the default 30 s: 30 s, 1 min, 2 min ... about an hour of tries before the job counts as failed.
        await this.jobs.define(MAIL_QUEUE, { retryLimit: 7, retryDelay: this.env.MAIL_RETRY_SECONDS, retryBackoff: true, expireInSeconds: 120 }, (m, info) => this.deliver(m, info.retryCount));
    }
    /** Refuses a request that cannot do its job without mail, before it writes anything. */
    assertEnabled() {
        if (!this.enabled)
            throw new AppError(503, 'mail_unavailable', NOT_SET_UP);
    }
    /** Queues a message; inside a transaction (`em`) it is sent only if that transaction commits. */
    async queue(message, em) {
        this.assertEnabled();
        await this.jobs.send(MAIL_QUEUE, message, em ? { em } : {});
    }
    /** Like queue, but when mail is off the message is only logged: for alerts nobody waits on. */
    async queueOrLog(message, em) {
        if (!this.enabled) {
            this.log.warn(`Not mailed (${message.tag}) to ${message.to}: ${message.subject} — e-mail is off.`);
            return false;
        }
        await this.queue(message, em);
        return true;
    }
    /** Starts any queued mail at once, e.g. after the transaction that queued it commits. */
    nudge() {
        this.jobs.nudge(MAIL_QUEUE);
    }
    async deliver(m, retryCount) {
        try {
            await this.smtp().sendMail({ from: this.env.SMTP_FROM, to: m.to, subject: m.subject, text: m.text, headers: { 'X-Breakline-Tag': m.tag } });
        }
        catch (e) {
            this.log.warn(`Mail (${m.tag}) to ${m.to} not delivered on try ${retryCount + 1}: ${e.message}; it will be tried again.`);
            throw e;
        }
    }
    smtp() {
        this.transport ??= nodemailer.createTransport({
            host: this.env.SMTP_HOST,
            port: this.env.SMTP_PORT,
            secure: this.env.SMTP_SECURE,
            ...(this.env.SMTP_USER ? { auth: { user: this.env.SMTP_USER, pass: this.env.SMTP_PASSWORD } } : {}),
            // A slow server fails the try, and the job queue tries again later.
            connectionTimeout: 20_000, greetingTimeout: 20_000, socketTimeout: 30_000,
        });
        return this.transport;
    }
};
MailService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [Env, JobsService])
], MailService);
export { MailService };
//# sourceMappingURL=mail.service.js.map