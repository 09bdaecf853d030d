import type { Actor, RecordKind, StoredRecord, WriteStamp } from '@breakline/sync-protocol';
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
  return {
    id: String(row.id), kind, clubId: String(row.club_id), version: Number(row.version), hlc: String(row.hlc),
    updatedAt: new Date(row.updated_at as string).toISOString(), deleted: row.deleted === true, fields,
    changeSeq: Number(row.change_seq), lastActor, fieldStamps: (row.field_stamps ?? {}) as Record<string, WriteStamp>,
  };
}

/** Record → the JSON object `jsonb_to_recordset` turns into a row. */
export function recordToRow(kind: RecordKind, r: StoredRecord): Row {
  const row: Row = {
    id: r.id, club_id: r.clubId, version: r.version, hlc: r.hlc, updated_at: r.updatedAt,
    updated_by: r.lastActor.userId, device_id: r.lastActor.deviceId, deleted: r.deleted,
    change_seq: r.changeSeq, field_stamps: r.fieldStamps,
  };
  for (const c of fieldColumns(kind)) row[c.column] = r.fields[c.field] ?? null;
  return row;
}
