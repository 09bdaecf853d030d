import { canSee, kindRules, type RecordKind, type Role } from '@breakline/sync-protocol';
import { ALL_KINDS, fieldColumns, snake, tableOf, type FieldColumn } from './columns.js';

const q = (name: string) => `"${name}"`;
const lit = (s: string) => `'${s.replace(/'/g, "''")}'`;

/** json_build_object takes at most 100 arguments: 50 key/value pairs. */
const MAX_PAIRS = 50;

function objectOf(pairs: string[], fn: 'json_build_object' | 'jsonb_build_object'): string {
  if (pairs.length <= MAX_PAIRS) return `${fn}(${pairs.join(', ')})`;
  // Wider kinds are built in parts and joined as jsonb (the order of keys does not matter).
  const parts: string[] = [];
  for (let i = 0; i < pairs.length; i += MAX_PAIRS) parts.push(`jsonb_build_object(${pairs.slice(i, i + MAX_PAIRS).join(', ')})`);
  return `(${parts.join(' || ')})`;
}

/**
 * SQL for a row's fields as the JSON a phone receives, read from the columns of `t`: the same
 * object rowToRecord makes (a field that is optional and not nullable is left out when NULL,
 * every other field is there, null or not).
 */
export function fieldsJson(columns: readonly FieldColumn[]): string {
  const pair = (c: FieldColumn) => `${lit(c.field)}, t.${q(c.column)}`;
  const omitted = columns.filter((c) => c.optional && !c.nullable);
  const always = columns.filter((c) => !(c.optional && !c.nullable)).map(pair);
  if (!omitted.length) return objectOf(always, 'json_build_object');
  const extra = omitted.map((c) => `CASE WHEN t.${q(c.column)} IS NULL THEN '{}'::jsonb ELSE jsonb_build_object(${pair(c)}) END`);
  return `(${[objectOf(always, 'jsonb_build_object'), ...extra].join(' || ')})`;
}

/**
 * SQL for a row of `kind` as a SyncRecord in JSON text, keys in the wire's order. Built by
 * PostgreSQL as text, a pulled page is never parsed into objects and written out again: for a
 * page of checks that round trip was most of the server's time.
 */
export function wireJson(kind: RecordKind): string {
  return `json_build_object('id', t.id, 'kind', ${lit(kind)}, 'clubId', t.club_id, 'version', t.version, 'hlc', t.hlc,
    'updatedAt', to_char(t.updated_at AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"'), 'deleted', t.deleted,
    'fields', ${fieldsJson(fieldColumns(kind))})::text`;
}

const ownerField = (kind: RecordKind) => kindRules(kind).access.ownerField as string | undefined;

/** The column whose value decides, beside the role, who may see a record of the kind (canSee). */
function ownerColumn(kind: RecordKind): string | undefined {
  const owner = ownerField(kind);
  return owner === undefined ? undefined : snake(owner);
}

/** One pulled record: its kind, change seq, JSON text and, for kinds with one, the owner's id. */
export interface WireRow { kind: RecordKind; changeSeq: number; json: string; owner: string | null }

/**
 * The part of the pull that reads a kind's records changed in (`$2`, `$3`] for club `$1`. Its
 * `k` is the kind's index in ALL_KINDS, so the rows can be told apart after the UNION.
 */
export function wireSelect(kind: RecordKind): string {
  const owner = ownerColumn(kind);
  return `SELECT ${ALL_KINDS.indexOf(kind)} AS k, t.change_seq, ${wireJson(kind)} AS json, ${owner ? `t.${q(owner)}::text` : 'NULL::text'} AS owner
    FROM ${q(tableOf(kind))} t WHERE t.club_id = $1 AND t.change_seq > $2 AND t.change_seq <= $3`;
}

/** Whether the caller may receive a pulled row: canSee by role and, where the kind has one, owner. */
export function mayReceive(row: WireRow, role: Role, userId: string): boolean {
  const owner = ownerField(row.kind);
  return canSee(row.kind, role, owner === undefined ? {} : { [owner]: row.owner }, userId);
}
