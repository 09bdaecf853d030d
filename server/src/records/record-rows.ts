import type { Actor, RecordKind, Role, StoredRecord, WriteStamp } from '@breakline/sync-protocol';
import { fieldColumns } from './columns.js';

/** A row of a kind table as PostgreSQL returns it (snake_case columns). */
export type Row = Record<string, unknown>;

/** Row → the record shape the shared sync rules work on. */
export function rowToRecord(kind: RecordKind, row: Row): StoredRecord {
  const fields: Record<string, unknown> = {};
  for (const c of fieldColumns(kind)) {
    const v = row[c.column];
    if (v === null && c.optional && !c.nullable) continue;
    fields[c.field] = v;
  }
  const lastActor: Actor = { deviceId: String(row.device_id), userId: String(row.updated_by) };
  if (row.updated_role) lastActor.role = row.updated_role as Role;
  return {
    id: String(row.id), kind, clubId: String(row.club_id), version: Number(row.version), hlc: String(row.hlc),
    updatedAt: new Date(row.updated_at as string).toISOString(), deleted: row.deleted === true, fields,
    changeSeq: Number(row.change_seq), lastActor, fieldStamps: expandStamps(kind, row, lastActor),
  };
}

/** Record → the JSON object `json_to_recordset` turns into a row. */
export function recordToRow(kind: RecordKind, r: StoredRecord): Row {
  const row: Row = {
    id: r.id, club_id: r.clubId, version: r.version, hlc: r.hlc, updated_at: r.updatedAt,
    updated_by: r.lastActor.userId, updated_role: r.lastActor.role ?? null, device_id: r.lastActor.deviceId, deleted: r.deleted,
    change_seq: r.changeSeq, field_stamps: compactStamps(r),
  };
  for (const c of fieldColumns(kind)) row[c.column] = r.fields[c.field] ?? null;
  return row;
}

const sameStamp = (s: WriteStamp, r: StoredRecord) =>
  s.hlc === r.hlc && s.actor.deviceId === r.lastActor.deviceId && s.actor.userId === r.lastActor.userId && s.actor.role === r.lastActor.role;

/**
 * Per-field stamps are kept only where they differ from the record's last write, which is most
 * fields after a create: storing all of them made a push write several times the bytes.
 */
function compactStamps(r: StoredRecord): Record<string, WriteStamp> {
  const out: Record<string, WriteStamp> = {};
  for (const [f, s] of Object.entries(r.fieldStamps)) if (!sameStamp(s, r)) out[f] = s;
  return out;
}

/**
 * The inverse: a field with no stamp of its own was written by the record's last write. Every
 * field gets its stamp back, so the next write cannot move the unstated ones to itself.
 */
function expandStamps(kind: RecordKind, row: Row, lastActor: Actor): Record<string, WriteStamp> {
  const out = { ...((row.field_stamps ?? {}) as Record<string, WriteStamp>) };
  const fallback: WriteStamp = { actor: lastActor, hlc: String(row.hlc) };
  for (const { field } of fieldColumns(kind)) out[field] ??= fallback;
  out.deleted ??= fallback;
  return out;
}
