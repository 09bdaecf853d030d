import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import {
  formatCheckpoint, needsFreshStart, parseCheckpoint, PullQuerySchema, type PullResponse,
} from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import type { Principal } from '../auth/principal.js';
import { recordStore } from '../records/record-store.js';
import { mayReceive, type WireRow } from '../records/wire-rows.js';

/** A PullResponse as JSON text, with the two values the answer's headers repeat. */
export interface PulledPage { json: string; checkpoint: string; hasMore: boolean }

/**
 * Pull: the club's records changed after a checkpoint, oldest change first, that the caller may
 * see. Checkpoints carry the purge horizon they were given under, so a fresh start below the
 * horizon goes on page after page while a replica from before the purge is sent back to the start.
 *
 * The answer is JSON text, a PullResponse, put together from records PostgreSQL wrote as JSON:
 * a page of a thousand checks is over a megabyte, and parsing it only to write it out again
 * took most of a pull's time.
 */
@Injectable()
export class PullService {
  constructor(private readonly db: DataSource) {}

  async pull(p: Principal, query: Record<string, unknown>): Promise<PulledPage> {
    const q = PullQuerySchema.safeParse(query);
    if (!q.success) {
      const details = q.error.issues.map((i) => ({ field: i.path.join('.') || 'query', message: i.message }));
      throw new AppError(400, 'validation_failed', 'The pull request is not valid.', details);
    }
    const since = parseCheckpoint(q.data.since);
    const limit = q.data.limit;
    // One snapshot for the horizon and the records: were a purge to commit between two separate
    // reads, a replica from before it would pass the check and then never see the purged deletes.
    return this.db.transaction('REPEATABLE READ', async (em) => {
      const [state] = await em.query('SELECT last_seq, purged_through_seq FROM sync_club_state WHERE club_id = $1', [p.clubId]);
      const horizon = Number(state?.purged_through_seq ?? 0);
      if (needsFreshStart(since, horizon, Number(state?.last_seq ?? 0))) {
        const reset: PullResponse = { changes: [], checkpoint: formatCheckpoint({ horizon, seq: Number(state?.last_seq ?? 0) }), hasMore: false, resetRequired: true };
        return { json: JSON.stringify(reset), checkpoint: reset.checkpoint, hasMore: false };
      }
      const { rows, hasMore } = await recordStore.changedPage(em, p.clubId, since.seq, limit);
      const seq = rows.length ? rows[rows.length - 1]!.changeSeq : since.seq;
      // Counted only when asked (the first page of a phone's pull): on every page of a large
      // club it would read the rest of the club's change index each time.
      const remaining = q.data.count !== '1' ? undefined : hasMore ? await recordStore.countChangedAfter(em, p.clubId, seq) : 0;
      return this.page(p, rows, { hasMore, remaining }, formatCheckpoint({ horizon, seq }));
    });
  }

  /** Records the caller may not see still move the checkpoint on, so they are never asked for again. */
  private page(p: Principal, rows: WireRow[], { hasMore, remaining }: { hasMore: boolean; remaining?: number }, checkpoint: string): PulledPage {
    const shown = rows.filter((r) => mayReceive(r, p.role, p.userId)).map((r) => r.json);
    const counted = remaining === undefined ? '' : `,"remaining":${remaining}`;
    const json = `{"changes":[${shown.join(',')}],"checkpoint":${JSON.stringify(checkpoint)},"hasMore":${hasMore}${counted}}`;
    return { json, checkpoint, hasMore };
  }
}
