import type { EntityManager } from 'typeorm';
import type { ConflictRecord } from '@breakline/sync-protocol';

export interface ChangeEntry {
  seq: number; kind: string; recordId: string; version: number; mutationId: string | null;
  deviceId: string; userId: string; hlc: string; patch: Record<string, unknown>; deleted: boolean; status: string;
}

/** Appends the batch's changes to the log in one statement. */
export async function appendChanges(em: EntityManager, clubId: string, entries: ChangeEntry[]) {
  if (!entries.length) return;
  await em.query(
    `INSERT INTO sync_changes (club_id, seq, kind, record_id, version, mutation_id, device_id, user_id, hlc, patch, deleted, status)
     SELECT $1, seq, kind, record_id, version, mutation_id, device_id, user_id, hlc, patch, deleted, status
     FROM jsonb_to_recordset($2::jsonb) AS x(seq bigint, kind text, record_id uuid, version int, mutation_id uuid,
       device_id text, user_id uuid, hlc text, patch jsonb, deleted boolean, status text)`,
    [clubId, JSON.stringify(entries.map((e) => ({
      seq: e.seq, kind: e.kind, record_id: e.recordId, version: e.version, mutation_id: e.mutationId, device_id: e.deviceId,
      user_id: e.userId, hlc: e.hlc, patch: e.patch, deleted: e.deleted, status: e.status,
    })))],
  );
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
