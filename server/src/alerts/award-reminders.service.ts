import { Injectable, type OnApplicationBootstrap } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { awardStatusOn, utcToLocal, type MemberAward } from '@breakline/sync-protocol';
import { JobsService } from '../jobs/jobs.service.js';
import { MailService } from '../mail/mail.service.js';
import { uid } from '../review/review-tables.js';
import { lapsingDigest, lapsingMail, type LapsingAward } from './alert-texts.js';
import { clubSupervisorEmails } from './club-supervisors.js';

const QUEUE = 'awards.lapsing';

interface CardRow { id: string; member_id: string; display_name: string; awards: MemberAward[] | null; email: string | null }

/**
 * Once a day: each award on a member card that has entered its last 30 days (sync-protocol's
 * "lapsing") is mailed about once, to its holder and, in one list a club, to the supervisors and
 * admins. A day missed is caught up the next day, since "lapsing" lasts the whole 30 days.
 */
@Injectable()
export class AwardRemindersService implements OnApplicationBootstrap {
  constructor(private readonly db: DataSource, private readonly jobs: JobsService, private readonly mail: MailService) {}

  async onApplicationBootstrap() {
    await this.jobs.define(QUEUE, { retryLimit: 3, retryDelay: 300 }, async () => { await this.run(); });
    // 19:00 UTC is early morning in eastern Australia and New Zealand.
    await this.jobs.schedule(QUEUE, '0 19 * * *');
  }

  /** Mails what has newly begun to lapse; returns the awards announced. */
  async run(now = new Date()): Promise<LapsingAward[]> {
    // With mail off nothing is recorded as announced, so turning mail on later still announces.
    if (!this.mail.enabled) return [];
    const clubs: { id: string; name: string; time_zone: string }[] = await this.db.query('SELECT id, name, time_zone FROM clubs ORDER BY id');
    const all: LapsingAward[] = [];
    for (const club of clubs) all.push(...await this.runClub(club, now));
    return all;
  }

  private async runClub(club: { id: string; name: string; time_zone: string }, now: Date): Promise<LapsingAward[]> {
    const today = utcToLocal(now, club.time_zone).date;
    // The card's id is its membership's; the holder is mailed at that membership's address.
    const cards: CardRow[] = await this.db.query(
      `SELECT c.id, c.member_id, c.display_name, c.awards, u.email
       FROM members c
       LEFT JOIN memberships m ON m.id = c.id AND m.club_id = c.club_id
       LEFT JOIN users u ON u.id = coalesce(m.user_id, ${uid('c.member_id')})
       WHERE c.club_id = $1 AND NOT c.deleted`, [club.id]);
    const candidates: { card: CardRow; award: MemberAward; info: LapsingAward }[] = [];
    for (const card of cards) {
      for (const award of card.awards ?? []) {
        if (!award.expiresOn) continue;
        const st = awardStatusOn({ name: award.name, awardedOn: award.awardedOn, expiresOn: award.expiresOn }, today);
        if (st.status === 'lapsing') candidates.push({ card, award, info: { holder: card.display_name, award: award.name, expiresOn: award.expiresOn, daysLeft: st.daysLeft! } });
      }
    }
    if (!candidates.length) return [];
    const announced = await this.db.transaction(async (em) => {
      const fresh: typeof candidates = [];
      for (const c of candidates) {
        const rows = await em.query(
          `INSERT INTO award_reminders (club_id, card_id, award_id, expires_on) VALUES ($1, $2, $3, $4) ON CONFLICT DO NOTHING RETURNING id`,
          [club.id, c.card.id, c.award.id, c.award.expiresOn]);
        if (rows.length) fresh.push(c);
      }
      for (const c of fresh) if (c.card.email) await this.mail.queueOrLog(lapsingMail(c.card.email, club.name, c.info), em);
      if (fresh.length) {
        const supervisors = await clubSupervisorEmails(em, club.id);
        const list = fresh.map((c) => c.info).sort((a, b) => a.expiresOn.localeCompare(b.expiresOn) || a.holder.localeCompare(b.holder));
        for (const s of supervisors) await this.mail.queueOrLog(lapsingDigest(s.email, club.name, list), em);
      }
      return fresh.map((c) => c.info);
    });
    if (announced.length) this.mail.nudge();
    return announced;
  }
}
