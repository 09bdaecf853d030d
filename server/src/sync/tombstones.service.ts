import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
import { recordStore } from '../records/record-store.js';
import { lockClub } from './club-lock.js';

const DAY = 86_400_000;

/**
 * Deleted records stay as tombstones for TOMBSTONE_RETENTION_DAYS, longer than any phone stays
 * offline, then go. A phone whose checkpoint is older than what was purged must pull afresh.
 */
@Injectable()
export class TombstonesService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly log = new Logger('Tombstones');
  private timer?: NodeJS.Timeout;

  constructor(private readonly db: DataSource, private readonly env: Env) {}

  onApplicationBootstrap() {
    if (this.env.NODE_ENV === 'test') return;
    this.timer = setInterval(() => this.purgeAll().catch((e) => this.log.error(e)), DAY);
    this.timer.unref();
  }

  onModuleDestroy() {
    clearInterval(this.timer);
  }

  async purgeAll(now = new Date()): Promise<number> {
    const clubs: { club_id: string }[] = await this.db.query('SELECT club_id FROM sync_club_state');
    let total = 0;
    for (const { club_id } of clubs) total += await this.purgeClub(club_id, now);
    return total;
  }

  /** Purges one club's old tombstones under the club's lock, and moves its horizon on. */
  async purgeClub(clubId: string, now = new Date()): Promise<number> {
    const before = new Date(now.getTime() - this.env.TOMBSTONE_RETENTION_DAYS * DAY);
    return this.db.transaction(async (em) => {
      await lockClub(em, clubId);
      const { highest, count } = await recordStore.purgeTombstones(em, clubId, before);
      if (highest > 0) {
        await em.query('UPDATE sync_club_state SET purged_through_seq = GREATEST(purged_through_seq, $2) WHERE club_id = $1', [clubId, highest]);
      }
      return count;
    });
  }
}
