import type { Actor, RecordKind, Role, StoredRecord, WriteStamp } from '@breakline/sync-protocol';
import { fieldColumns } from './columns.js';
import type { InputColumn } from './batch-input.js';

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

type Column = InputColumn<StoredRecord>;

/**
 * A record as one row of the JSON a bulk write reads (see batchInput and recordStore.upsertParts):
 * the sync columns, the shareable ones often one value for the whole batch, and the kind's fields
 * as one object under their own names, which jsonb_to_record then takes apart into columns. The
 * fields object goes as it is, not copied into columns, and the change log can take a new
 * record's fields from the same parse.
 */
export const RECORD_INPUT_COLUMNS: readonly Column[] = [
  { name: 'id', type: 'uuid', get: (r) => r.id },
  { name: 'club_id', type: 'uuid', get: (r) => r.clubId, shareable: true },
  { name: 'version', type: 'int', get: (r) => r.version, shareable: true },
  { name: 'hlc', type: 'text', get: (r) => r.hlc },
  { name: 'updated_at', type: 'timestamptz', get: (r) => r.updatedAt, shareable: true },
  { name: 'updated_by', type: 'uuid', get: (r) => r.lastActor.userId, shareable: true },
  { name: 'updated_role', type: 'text', get: (r) => r.lastActor.role ?? null, shareable: true },
  { name: 'device_id', type: 'text', get: (r) => r.lastActor.deviceId, shareable: true },
  { name: 'deleted', type: 'boolean', get: (r) => r.deleted, shareable: true },
  { name: 'change_seq', type: 'bigint', get: (r) => r.changeSeq },
  { name: 'field_stamps', type: 'jsonb', get: (r) => compactStamps(r), whenAbsent: `'{}'::jsonb` },
  { name: 'fields', type: 'jsonb', get: (r) => r.fields },
];

const sameStamp = (s: WriteStamp, r: StoredRecord) =>
  s.hlc === r.hlc && s.actor.deviceId === r.lastActor.deviceId && s.actor.userId === r.lastActor.userId && s.actor.role === r.lastActor.role;

/**
 * Per-field stamps are kept only where they differ from the record's last write, which is most
 * fields after a create: storing all of them made a push write several times the bytes. None
 * left (undefined) is stored as {}.
 */
function compactStamps(r: StoredRecord): Record<string, WriteStamp> | undefined {
  let out: Record<string, WriteStamp> | undefined;
  for (const f in r.fieldStamps) {
    const s = r.fieldStamps[f]!;
    if (!sameStamp(s, r)) (out ??= {})[f] = s;
  }
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
