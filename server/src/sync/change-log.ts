import type { EntityManager } from 'typeorm';
import type { ConflictRecord, RecordKind, StoredRecord } from '@breakline/sync-protocol';
import { recordStore } from '../records/record-store.js';

export interface ChangeEntry {
  seq: number; kind: string; recordId: string; version: number; mutationId: string | null;
  deviceId: string; userId: string; hlc: string; patch: Record<string, unknown>; deleted: boolean; status: string;
}

/**
 * Writes a batch in one statement: each kind's records upserted and the changes appended to the
 * log, as data-modifying parts of one WITH, and the club's change counter moved to `lastSeq`.
 * One statement is one trip to the database and one plan, however many kinds the batch touches.
 */
export async function writeChanges(
  em: EntityManager, clubId: string, records: Map<RecordKind, StoredRecord[]>, entries: ChangeEntry[], lastSeq: number,
) {
  const params: unknown[] = [clubId, lastSeq];
  const parts: string[] = [];
  for (const [kind, recs] of records) {
    if (!recs.length) continue;
    params.push(recordStore.rowsJson(kind, recs));
    parts.push(`r${parts.length} AS (${recordStore.upsertSql(kind, params.length)})`);
  }
  parts.push('club_seq AS (UPDATE sync_club_state SET last_seq = $2 WHERE club_id = $1)');
  params.push(changesJson(entries));
  await em.query(
    `WITH ${parts.join(',\n')}
     INSERT INTO sync_changes (club_id, seq, kind, record_id, version, mutation_id, device_id, user_id, hlc, patch, deleted, status)
     SELECT $1, seq, kind, record_id, version, mutation_id, device_id, user_id, hlc, patch, deleted, status
     FROM json_to_recordset($${params.length}::json) AS x(seq bigint, kind text, record_id uuid, version int, mutation_id uuid,
       device_id text, user_id uuid, hlc text, patch jsonb, deleted boolean, status text)`,
    params,
  );
}

function changesJson(entries: ChangeEntry[]): string {
  return JSON.stringify(entries.map((e) => ({
    seq: e.seq, kind: e.kind, record_id: e.recordId, version: e.version, mutation_id: e.mutationId, device_id: e.deviceId,
    user_id: e.userId, hlc: e.hlc, patch: e.patch, deleted: e.deleted, status: e.status,
  })));
}

/** Stores the conflicts a batch raised, in one statement. */
export async function insertConflicts(em: EntityManager, conflicts: ConflictRecord[]) {
  if (!conflicts.length) return;
  await em.query(
    `INSERT INTO sync_conflicts (id, club_id, record_id, kind, field, kept_value, overruled_value, kept, overruled, status, created_at)
     SELECT id, club_id, record_id, kind, field, kept_value, overruled_value, kept, overruled, status, created_at
     FROM jsonb_to_recordset($1::jsonb) AS x(id uuid, club_id uuid, record_id uuid, kind text, field text, kept_value jsonb,
       overruled_value jsonb, kept jsonb, overruled jsonb, status text, created_at timestamptz)`,
    [JSON.stringify(conflicts.map((c) => ({
      id: c.id, club_id: c.clubId, record_id: c.recordId, kind: c.kind, field: c.field, kept_value: c.keptValue ?? null,
      overruled_value: c.overruledValue ?? null, kept: c.kept, overruled: c.overruled, status: c.status, created_at: c.createdAt,
    })))],
  );
}
