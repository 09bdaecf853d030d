import { Injectable } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';
import {
  HybridClock, settleConflict, type ClubState, type ConflictRecord, type RecordKind,
} from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import type { Principal } from '../auth/principal.js';
import { recordStore } from '../records/record-store.js';
import { writeChanges } from './change-log.js';
import { lockClub } from './club-lock.js';
import { assertProtocol, toAppError } from './sync-errors.js';
import { conflictFromRow, type ConflictRow } from './conflict-rows.js';

/** Conflicts a supervisor reads and settles; a settlement is a normal change every phone pulls. */
@Injectable()
export class ConflictsService {
  private readonly clock = new HybridClock('server');

  constructor(private readonly db: DataSource) {}

  async list(p: Principal, status: 'open' | 'settled' | 'all' = 'open'): Promise<ConflictRecord[]> {
    const rows: ConflictRow[] = await this.db.query(
      `SELECT * FROM sync_conflicts WHERE club_id = $1 AND ($2 = 'all' OR status = $2) ORDER BY created_at, id LIMIT 500`, [p.clubId, status]);
    return rows.map(conflictFromRow);
  }

  async openCount(p: Principal): Promise<number> {
    const [row] = await this.db.query(`SELECT count(*)::int AS n FROM sync_conflicts WHERE club_id = $1 AND status = 'open'`, [p.clubId]);
    return row.n;
  }

  async settle(p: Principal, conflictId: string, body: Record<string, unknown>): Promise<ConflictRecord> {
    assertProtocol(body);
    return this.db.transaction(async (em) => {
      const locked = await lockClub(em, p.clubId);
      const [row]: ConflictRow[] = await em.query('SELECT * FROM sync_conflicts WHERE id = $1 AND club_id = $2', [conflictId, p.clubId]);
      if (!row) throw new AppError(404, 'not_found', 'That conflict does not exist in your club.');
      const conflict = conflictFromRow(row);
      const [record] = await recordStore.loadMany(em, conflict.kind as RecordKind, [conflict.recordId]);
      const club: ClubState = {
        records: record && record.clubId === p.clubId ? { [record.id]: record } : {},
        changeSeq: locked.lastSeq, deviceSeq: {}, conflicts: [conflict], purgedThrough: locked.purgedThroughSeq,
      };
      let settled: ConflictRecord;
      try {
        settled = settleConflict({ club, auth: { userId: p.userId, role: p.role, clubId: p.clubId }, pt: Date.now(), clock: this.clock }, { ...body, conflictId } as never);
      } catch (e) {
        throw toAppError(e);
      }
      await this.persist(em, p, club, locked.lastSeq, settled);
      return settled;
    });
  }

  private async persist(em: EntityManager, p: Principal, club: ClubState, startSeq: number, settled: ConflictRecord) {
    const rec = club.records[settled.recordId];
    if (rec && rec.changeSeq > startSeq) {
      const field = settled.field.split('.')[0]!;
      await writeChanges(em, p.clubId, new Map([[rec.kind, [rec]]]), [{
        seq: rec.changeSeq, kind: rec.kind, recordId: rec.id, version: rec.version, mutationId: null, deviceId: 'server',
        userId: p.userId, hlc: rec.hlc, patch: field === 'deleted' ? {} : { [field]: rec.fields[field] }, deleted: rec.deleted, status: 'settled',
      }], club.changeSeq);
    }
    await em.query(
      `UPDATE sync_conflicts SET status = 'settled', settled_by = $2, settled_at = $3, settled_value = $4::jsonb, note = $5 WHERE id = $1`,
      [settled.id, p.userId, settled.settledAt, JSON.stringify(settled.settledValue ?? null), settled.note ?? null]);
  }
}
