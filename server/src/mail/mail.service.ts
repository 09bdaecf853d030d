import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import nodemailer, { type Transporter } from 'nodemailer';
import type { EntityManager } from 'typeorm';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
import { JobsService } from '../jobs/jobs.service.js';
import { MAIL_QUEUE, type MailMessage } from './mail.types.js';

const NOT_SET_UP = 'E-mail is not set up on this server, so the message cannot be sent. Ask whoever runs Breakline to set SMTP_HOST.';

/**
 * Mail goes out as jobs: a request only writes the job, and a worker hands it to the SMTP server,
 * retrying with growing waits when that server is slow or down.
 */
@Injectable()
export class MailService implements OnApplicationBootstrap {
  private readonly log = new Logger('Mail');
  private transport: Transporter | null = null;

  constructor(private readonly env: Env, private readonly jobs: JobsService) {}

  get enabled(): boolean {
    return Boolean(this.env.SMTP_HOST);
  }

  async onApplicationBootstrap() {
    if (!this.enabled) {
      this.log.warn('SMTP_HOST is not set: e-mail is off (invitations cannot be sent; alerts are logged only).');
      return;
    }
    // With the default 30 s: 30 s, 1 min, 2 min ... about an hour of tries before the job counts as failed.
    await this.jobs.define<MailMessage>(MAIL_QUEUE, { retryLimit: 7, retryDelay: this.env.MAIL_RETRY_SECONDS, retryBackoff: true, expireInSeconds: 120 }, (m, info) => this.deliver(m, info.retryCount));
  }

  /** Refuses a request that cannot do its job without mail, before it writes anything. */
  assertEnabled(): void {
    if (!this.enabled) throw new AppError(503, 'mail_unavailable', NOT_SET_UP);
  }

  /** Queues a message; inside a transaction (`em`) it is sent only if that transaction commits. */
  async queue(message: MailMessage, em?: EntityManager): Promise<void> {
    this.assertEnabled();
    await this.jobs.send(MAIL_QUEUE, message, em ? { em } : {});
  }

  /** Like queue, but when mail is off the message is only logged: for alerts nobody waits on. */
  async queueOrLog(message: MailMessage, em?: EntityManager): Promise<boolean> {
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

  private async deliver(m: MailMessage, retryCount: number) {
    try {
      await this.smtp().sendMail({ from: this.env.SMTP_FROM, to: m.to, subject: m.subject, text: m.text, headers: { 'X-Breakline-Tag': m.tag } });
    } catch (e) {
      this.log.warn(`Mail (${m.tag}) to ${m.to} not delivered on try ${retryCount + 1}: ${(e as Error).message}; it will be tried again.`);
      throw e;
    }
  }

  private smtp(): Transporter {
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
}
