import type { EntityManager } from 'typeorm';
import type { RecordKind, StoredRecord } from '@breakline/sync-protocol';
import { ALL_KINDS, fieldColumns, tableOf } from './columns.js';
import { recordToRow, rowToRecord, type Row } from './record-rows.js';

const SYNC_COLUMNS: [string, string][] = [
  ['id', 'uuid'], ['club_id', 'uuid'], ['version', 'int'], ['hlc', 'text'], ['updated_at', 'timestamptz'],
  ['updated_by', 'uuid'], ['updated_role', 'text'], ['device_id', 'text'], ['deleted', 'boolean'], ['change_seq', 'bigint'], ['field_stamps', 'jsonb'],
];

const columnsOf = (kind: RecordKind): [string, string][] => [...SYNC_COLUMNS, ...fieldColumns(kind).map((c): [string, string] => [c.column, c.type])];
const q = (name: string) => `"${name}"`;

/** Kind-table reads and writes as single multi-row statements, never one entity at a time. */
export const recordStore = {
  /**
   * Records of one kind with these ids, of any club: the caller refuses ids that belong to
   * another club. No row lock is needed: the push holds its club's lock, and only pushes and
   * settlements of that club write these rows.
   */
  async loadMany(em: EntityManager, kind: RecordKind, ids: string[]): Promise<StoredRecord[]> {
    if (!ids.length) return [];
    const rows: Row[] = await em.query(`SELECT * FROM ${q(tableOf(kind))} WHERE id = ANY($1::uuid[])`, [ids]);
    return rows.map((r) => rowToRecord(kind, r));
  },

  /** Inserts or replaces records in one statement through jsonb_to_recordset. */
  async upsertMany(em: EntityManager, kind: RecordKind, records: StoredRecord[]): Promise<void> {
    if (!records.length) return;
    const cols = columnsOf(kind);
    const names = cols.map(([n]) => q(n)).join(', ');
    const defs = cols.map(([n, t]) => `${q(n)} ${t}`).join(', ');
    const updates = cols.filter(([n]) => n !== 'id' && n !== 'club_id').map(([n]) => `${q(n)} = EXCLUDED.${q(n)}`).join(', ');
    const table = q(tableOf(kind));
    await em.query(
      `INSERT INTO ${table} (${names}) SELECT ${names} FROM jsonb_to_recordset($1::jsonb) AS x(${defs})
       ON CONFLICT (id) DO UPDATE SET ${updates} WHERE ${table}.club_id = EXCLUDED.club_id`,
      [JSON.stringify(records.map((r) => recordToRow(kind, r)))],
    );
  },

  /**
   * The club's records changed after `since`, oldest change first, at most `limit` + 1 (the extra
   * one tells whether there is more). Each kind's (club_id, change_seq) index is scanned for at
   * most limit + 1 rows, so the cost follows the page size, not the history.
   */
  async changedAfter(em: EntityManager, clubId: string, since: number, limit: number): Promise<StoredRecord[]> {
    const parts = ALL_KINDS.map((kind, i) =>
      `(SELECT ${i} AS k, to_jsonb(t) AS row FROM ${q(tableOf(kind))} t WHERE club_id = $1 AND change_seq > $2 ORDER BY change_seq LIMIT $3)`);
    const rows: { k: number; row: Row }[] = await em.query(
      `SELECT k, row FROM (${parts.join(' UNION ALL ')}) u ORDER BY (row->>'change_seq')::bigint LIMIT $3`, [clubId, since, limit + 1]);
    return rows.map(({ k, row }) => rowToRecord(ALL_KINDS[k]!, row));
  },

  /** Drops tombstones older than `before`; returns how many and the highest change seq removed. */
  async purgeTombstones(em: EntityManager, clubId: string, before: Date): Promise<{ highest: number; count: number }> {
    let highest = 0;
    let count = 0;
    for (const kind of ALL_KINDS) {
      const [row]: { n: number; hi: string }[] = await em.query(
        `WITH gone AS (DELETE FROM ${q(tableOf(kind))} WHERE club_id = $1 AND deleted AND updated_at < $2 RETURNING change_seq)
         SELECT count(*)::int AS n, coalesce(max(change_seq), 0) AS hi FROM gone`, [clubId, before]);
      highest = Math.max(highest, Number(row!.hi));
      count += row!.n;
    }
    return { highest, count };
  },
};
