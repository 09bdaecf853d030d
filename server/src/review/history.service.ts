import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { canSee, deepEqual, fieldLabel, isRecordKind, kindSpec, type RecordKind } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import type { Principal } from '../auth/principal.js';
import { recordStore } from '../records/record-store.js';

export interface FieldChange { from: unknown; to: unknown; label: string }

export interface VersionDto {
  version: number;
  hlc: string;
  /** When the server accepted the change. */
  at: string;
  user: { id: string; name: string | null };
  deviceId: string;
  /** applied, merged, conflict (kept with a conflict to settle) or settled (a supervisor's settlement). */
  status: string;
  deleted: boolean;
  changes: Record<string, FieldChange>;
}

export interface HistoryDto { kind: RecordKind; id: string; versions: VersionDto[] }

interface ChangeRow {
  version: number; hlc: string; created_at: Date; user_id: string; display_name: string | null;
  device_id: string; status: string; patch: Record<string, unknown>; deleted: boolean;
}

/** A record's versions from the change log: who, when, from which device, and what each changed. */
@Injectable()
export class HistoryService {
  constructor(private readonly db: DataSource) {}

  async history(p: Principal, kind: string, id: string): Promise<HistoryDto> {
    if (!isRecordKind(kind)) throw new AppError(404, 'not_found', `There is no record kind "${kind}".`);
    const [rec] = await recordStore.loadMany(this.db.manager, kind, [id]);
    // Another club's record answers exactly like a missing one.
    if (!rec || rec.clubId !== p.clubId) throw new AppError(404, 'not_found', `There is no such ${kindSpec(kind).label.replace(/^an? /, '')} in your club.`);
    if (!canSee(kind, p.role, rec.fields, p.userId)) throw new AppError(403, 'forbidden', `You do not have access to this ${kindSpec(kind).label.replace(/^an? /, '')}.`);
    const rows: ChangeRow[] = await this.db.query(
      `SELECT c.version, c.hlc, c.created_at, c.user_id, u.display_name, c.device_id, c.status, c.patch, c.deleted
       FROM sync_changes c
       LEFT JOIN memberships m ON m.club_id = c.club_id AND m.user_id = c.user_id
       LEFT JOIN users u ON u.id = m.user_id
       WHERE c.club_id = $1 AND c.record_id = $2 AND c.kind = $3 ORDER BY c.seq`, [p.clubId, id, kind]);
    const state: Record<string, unknown> = {};
    let deleted = false;
    const versions = rows.map((r): VersionDto => {
      const changes: Record<string, FieldChange> = {};
      for (const [field, to] of Object.entries(r.patch ?? {})) {
        const from = state[field] ?? null;
        if (!deepEqual(from, to)) changes[field] = { from, to, label: fieldLabel([field]) };
        state[field] = to;
      }
      if (r.deleted !== deleted) changes.deleted = { from: deleted, to: r.deleted, label: 'deleted' };
      deleted = r.deleted;
      return {
        version: r.version, hlc: r.hlc, at: new Date(r.created_at).toISOString(), user: { id: r.user_id, name: r.display_name },
        deviceId: r.device_id, status: r.status, deleted: r.deleted, changes,
      };
    });
    return { kind, id, versions };
  }
}
