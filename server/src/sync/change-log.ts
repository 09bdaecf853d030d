import type { EntityManager } from 'typeorm';
import type { ConflictRecord, MutationError, RecordKind, StoredRecord } from '@breakline/sync-protocol';
import { recordStore } from '../records/record-store.js';
import { batchInput, type InputColumn } from '../records/batch-input.js';

export interface ChangeEntry {
  seq: number; kind: string; recordId: string; version: number; mutationId: string | null;
  deviceId: string; userId: string; hlc: string; patch: Record<string, unknown>; deleted: boolean; status: string;
}

const CHANGE_COLUMNS: InputColumn<ChangeEntry>[] = [
  { name: 'seq', type: 'bigint', get: (e) => e.seq },
  { name: 'kind', type: 'text', get: (e) => e.kind, shareable: true },
  { name: 'record_id', type: 'uuid', get: (e) => e.recordId },
  { name: 'version', type: 'int', get: (e) => e.version, shareable: true },
  { name: 'mutation_id', type: 'uuid', get: (e) => e.mutationId },
  { name: 'device_id', type: 'text', get: (e) => e.deviceId, shareable: true },
  { name: 'user_id', type: 'uuid', get: (e) => e.userId, shareable: true },
  { name: 'hlc', type: 'text', get: (e) => e.hlc },
  { name: 'patch', type: 'jsonb', get: (e) => e.patch },
  { name: 'deleted', type: 'boolean', get: (e) => e.deleted, shareable: true },
  { name: 'status', type: 'text', get: (e) => e.status, shareable: true },
];

/**
 * Writes a batch in one statement: each kind's records upserted and the changes appended to the
 * log, as data-modifying parts of one WITH, and the club's change counter moved to `lastSeq`.
 * One statement is one trip to the database and one plan, however many kinds the batch touches.
 * A change whose patch is its record's fields as written (a new record) does not send them
 * twice: the log takes them from the records' input. `also` adds parts of the caller's own.
 */
export async function writeChanges(
  em: EntityManager, clubId: string, records: Map<RecordKind, StoredRecord[]>, entries: ChangeEntry[], lastSeq: number,
  also: ((params: unknown[]) => string)[] = [],
) {
  const params: unknown[] = [clubId, lastSeq];
  // Further parts of the same WITH (the pushing device's seq), each adding its own values.
  const parts: string[] = also.map((part) => part(params));
  const inputs: string[] = [];
  const written = new Set<unknown>();
  for (const [kind, recs] of records) {
    if (!recs.length) continue;
    const name = `in${inputs.length}`;
    const { input, upsert } = recordStore.upsertParts(kind, recs, params, name);
    parts.push(input, `up${inputs.length} AS (${upsert})`);
    inputs.push(name);
    for (const r of recs) written.add(r.fields);
  }
  parts.push('club_seq AS (UPDATE sync_club_state SET last_seq = $2 WHERE club_id = $1)');
  const shared = entries.some((e) => written.has(e.patch));
  const columns = CHANGE_COLUMNS.map((c): InputColumn<ChangeEntry> =>
    c.name === 'patch' ? { ...c, get: (e) => (written.has(e.patch) ? undefined : e.patch) } : c);
  const { exprs, from } = batchInput(entries, columns, params);
  const patch = columns.findIndex((c) => c.name === 'patch');
  let source = from;
  if (shared) {
    exprs[patch] = `coalesce(${exprs[patch]}, w.fields)`;
    source = `${from} LEFT JOIN (${inputs.map((n) => `SELECT id, fields FROM ${n}`).join(' UNION ALL ')}) w ON x.patch IS NULL AND w.id = x.record_id`;
  }
  await em.query(
    `WITH ${parts.join(',\n')}
     INSERT INTO sync_changes (club_id, ${columns.map((c) => c.name).join(', ')})
     SELECT $1, ${exprs.join(', ')} FROM ${source}`,
    params,
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

/** A refused change of a batch, kept so a replay of it gets the same answer. */
export interface Refusal { mutationId: string; error: MutationError }

/** Keeps the batch's refusals, in one statement; a replayed refusal is already there and stays as it was. */
export async function insertRefusals(em: EntityManager, clubId: string, deviceId: string, refusals: Refusal[]) {
  if (!refusals.length) return;
  await em.query(
    `INSERT INTO sync_refusals (club_id, mutation_id, device_id, error)
     SELECT $1, x.mutation_id, $2, x.error FROM jsonb_to_recordset($3::jsonb) AS x(mutation_id uuid, error jsonb)
     ON CONFLICT DO NOTHING`,
    [clubId, deviceId, JSON.stringify(refusals.map((r) => ({ mutation_id: r.mutationId, error: r.error })))],
  );
}

/** The refusals kept for these mutation ids, by id. */
export async function loadRefusals(em: EntityManager, clubId: string, mutationIds: string[]): Promise<Map<string, MutationError>> {
  if (!mutationIds.length) return new Map();
  const rows: { mutation_id: string; error: MutationError }[] = await em.query(
    'SELECT mutation_id, error FROM sync_refusals WHERE club_id = $1 AND mutation_id = ANY($2::uuid[])', [clubId, mutationIds]);
  return new Map(rows.map((r) => [r.mutation_id, r.error]));
}
