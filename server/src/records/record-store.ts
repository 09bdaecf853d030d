import type { EntityManager } from 'typeorm';
import type { RecordKind, StoredRecord } from '@breakline/sync-protocol';
import { ALL_KINDS, fieldColumns, tableOf } from './columns.js';
import { batchInput } from './batch-input.js';
import { RECORD_INPUT_COLUMNS, rowToRecord, type Row } from './record-rows.js';

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

  /** Inserts or replaces records in one statement (see upsertParts). */
  async upsertMany(em: EntityManager, kind: RecordKind, records: StoredRecord[]): Promise<void> {
    if (!records.length) return;
    const params: unknown[] = [];
    const { input, upsert } = recordStore.upsertParts(kind, records, params, 'records');
    await em.query(`WITH ${input} ${upsert}`, params);
  },

  /**
   * An upsert of `records` in two parts, its inputs appended to `params`: `input`, a WITH item
   * `<name>` holding the rows read from their JSON (other parts of the statement may read it),
   * and `upsert`, the INSERT ... ON CONFLICT that writes them. The JSON goes as json, not jsonb:
   * jsonb input builds (and sorts the keys of) a binary copy of every row only to take it apart
   * again; json took about two thirds of the time for a 10,000-record push.
   */
  upsertParts(kind: RecordKind, records: StoredRecord[], params: unknown[], name: string): { input: string; upsert: string } {
    const { exprs, from } = batchInput(records, RECORD_INPUT_COLUMNS, params);
    const selected = exprs.map((e, i) => `${e} AS ${q(RECORD_INPUT_COLUMNS[i]!.name)}`).join(', ');
    const sync = RECORD_INPUT_COLUMNS.map((c) => c.name).filter((n) => n !== 'fields');
    const fields = fieldColumns(kind);
    const table = q(tableOf(kind));
    const names = [...sync, ...fields.map((c) => c.column)].map(q);
    const values = [...sync.map((n) => `i.${q(n)}`), ...fields.map((c) => `f.${q(c.field)}`)].join(', ');
    const updates = names.filter((n) => n !== '"id"' && n !== '"club_id"').map((n) => `${n} = EXCLUDED.${n}`).join(', ');
    return {
      input: `${name} AS MATERIALIZED (SELECT ${selected} FROM ${from})`,
      upsert: `INSERT INTO ${table} (${names.join(', ')})
       SELECT ${values} FROM ${name} i CROSS JOIN LATERAL jsonb_to_record(i.fields) AS f(${fields.map((c) => `${q(c.field)} ${c.type}`).join(', ')})
       ON CONFLICT (id) DO UPDATE SET ${updates} WHERE ${table}.club_id = EXCLUDED.club_id`,
    };
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
