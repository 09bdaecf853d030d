import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { canSee, PullQuerySchema, toWire, type PullResponse } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import type { Principal } from '../auth/principal.js';
import { recordStore } from '../records/record-store.js';

/** Pull: the club's records changed after a checkpoint, oldest change first, that the caller may see. */
@Injectable()
export class PullService {
  constructor(private readonly db: DataSource) {}

  async pull(p: Principal, query: Record<string, unknown>): Promise<PullResponse> {
    const q = PullQuerySchema.safeParse(query);
    if (!q.success) {
      const details = q.error.issues.map((i) => ({ field: i.path.join('.') || 'query', message: i.message }));
      throw new AppError(400, 'validation_failed', 'The pull request is not valid.', details);
    }
    const since = Number(q.data.since ?? 0);
    const limit = q.data.limit;
    const [state] = await this.db.query('SELECT last_seq, purged_through_seq FROM sync_club_state WHERE club_id = $1', [p.clubId]);
    const purged = Number(state?.purged_through_seq ?? 0);
    if (since > 0 && since < purged) {
      return { changes: [], checkpoint: String(state.last_seq), hasMore: false, resetRequired: true };
    }
    const rows = await recordStore.changedAfter(this.db.manager, p.clubId, since, limit);
    const page = rows.slice(0, limit);
    // Records the caller may not see still move the checkpoint on, so they are never asked for again.
    const changes = page.filter((r) => canSee(r.kind, p.role, r.fields, p.userId)).map(toWire);
    const checkpoint = page.length ? String(page[page.length - 1]!.changeSeq) : String(since);
    return { changes, checkpoint, hasMore: rows.length > limit };
  }
}
