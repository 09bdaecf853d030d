import { Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';
import { Env } from '../config/env.js';
import { MailService } from '../mail/mail.service.js';
import { appUrl } from '../mail/app-url.js';
import { uid } from '../review/review-tables.js';
import { standDownMail } from './alert-texts.js';
import { clubSupervisorEmails } from './club-supervisors.js';

/** How often the unsent-alert index is looked at: a single index probe, so cheap to do often. */
const POLL_MS = 2000;
const BATCH = 50;
const UNDEFINED_TABLE = '42P01';

interface AlertRow {
  id: string; club_id: string; defect_id: string; deleted: boolean | null; description: string | null; status: string | null;
  reported_at: string | null; boat_name: string | null; fleet_number: string | null; motor_serial: string | null;
  reporter: string | null; reported_by: string | null; club_name: string; time_zone: string;
}

/**
 * E-mails a club's supervisors and admins when a defect begins to stand a boat down. The alert row
 * is written by a trigger on the defects table in the defect's own transaction (push, settlement
 * or seed alike); this service mails each unsent alert once, however many servers run.
 */
@Injectable()
export class StandDownAlertsService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly log = new Logger('StandDownAlerts');
  private timer?: NodeJS.Timeout;
  private running: Promise<void> | null = null;

  constructor(private readonly db: DataSource, private readonly env: Env, private readonly mail: MailService) {}

  onApplicationBootstrap() {
    this.timer = setInterval(() => void this.tick(), POLL_MS);
    this.timer.unref();
    void this.tick();
  }

  async onApplicationShutdown() {
    clearInterval(this.timer);
    await this.running;
  }

  private tick(): Promise<void> {
    this.running ??= this.dispatch()
      .then(() => undefined)
      .catch((e: Error & { code?: string }) => {
        // Before the first migration (a fresh database) the table is not there yet.
        if (e.code !== UNDEFINED_TABLE) this.log.error(`Stand-down alerts: ${e.message}`);
      })
      .finally(() => { this.running = null; });
    return this.running;
  }

  /** Mails every unsent alert; returns how many alerts were handled. */
  async dispatch(): Promise<number> {
    let handled = 0;
    for (;;) {
      const n = await this.db.transaction((em) => this.batch(em));
      handled += n;
      if (n) this.mail.nudge();
      if (n < BATCH) return handled;
    }
  }

  private async batch(em: EntityManager): Promise<number> {
    const alerts: AlertRow[] = await em.query(
      `SELECT a.id, a.club_id, a.defect_id, d.deleted, d.description, d.status, d.reported_at, d.reported_by,
              b.name AS boat_name, b.fleet_number, mo.serial AS motor_serial, ru.display_name AS reporter, c.name AS club_name, c.time_zone
       FROM (SELECT * FROM stand_down_alerts WHERE sent_at IS NULL ORDER BY created_at LIMIT ${BATCH} FOR UPDATE SKIP LOCKED) a
       JOIN clubs c ON c.id = a.club_id
       LEFT JOIN defects d ON d.id = a.defect_id AND d.club_id = a.club_id
       LEFT JOIN boats b ON b.club_id = a.club_id AND b.id = ${uid('d.boat_id')}
       LEFT JOIN motors mo ON mo.club_id = a.club_id AND mo.id = ${uid('d.motor_id')}
       LEFT JOIN memberships rm ON rm.club_id = a.club_id AND rm.user_id = ${uid('d.reported_by')}
       LEFT JOIN users ru ON ru.id = rm.user_id
       ORDER BY a.created_at`);
    // A batch often holds several alerts of one club: read each club's supervisors once.
    const supervisorsOf = new Map<string, Promise<{ email: string }[]>>();
    const supervisors = (clubId: string) => {
      if (!supervisorsOf.has(clubId)) {
        supervisorsOf.set(clubId, clubSupervisorEmails(em, clubId));
      }
      return supervisorsOf.get(clubId)!;
    };
    for (const a of alerts) {
      let sent = 0;
      if (a.description !== null && !a.deleted) {
        const people = await supervisors(a.club_id);
        const boat = [a.fleet_number, a.boat_name].filter(Boolean).join(' ') || 'A boat';
        for (const { email } of people) {
          const mailed = await this.mail.queueOrLog(standDownMail({
            to: email, clubName: a.club_name, zone: a.time_zone, boat, description: a.description, reporter: a.reporter ?? a.reported_by ?? 'someone',
            reportedAt: a.reported_at!, status: a.status ?? 'open', motor: a.motor_serial, deskUrl: appUrl(this.env),
          }), em);
          if (mailed) sent++;
        }
      }
      await em.query('UPDATE stand_down_alerts SET sent_at = now(), recipients = $2 WHERE id = $1', [a.id, sent]);
    }
    return alerts.length;
  }
}
