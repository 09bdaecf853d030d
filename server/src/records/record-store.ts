import type { EntityManager } from 'typeorm';
import type { RecordKind, StoredRecord } from '@breakline/sync-protocol';
import { ALL_KINDS, fieldColumns, tableOf } from './columns.js';
import { batchInput } from './batch-input.js';
import { RECORD_INPUT_COLUMNS, rowToRecord, type Row } from './record-rows.js';
import { wireSelect, type WireRow } from './wire-rows.js';

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

  /**
   * The kinds, of any club, that hold these ids: ids are unique across kinds, since a phone keys
   * its records by id alone. One statement over every kind's primary key.
   */
  async kindsHolding(em: EntityManager, ids: string[]): Promise<Map<string, RecordKind>> {
    if (!ids.length) return new Map();
    const parts = ALL_KINDS.map((kind, i) => `SELECT id::text AS id, ${i} AS k FROM ${q(tableOf(kind))} WHERE id = ANY($1::uuid[])`);
    const rows: { id: string; k: number }[] = await em.query(parts.join(' UNION ALL '), [ids]);
    return new Map(rows.map((r) => [r.id, ALL_KINDS[r.k]!]));
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
   * A page of the club's records changed after `since`, oldest change first: at most `limit`, as
   * the JSON a phone receives (see wire-rows.ts), and whether more follow. The page's last change
   * seq is found first from the kinds' (club_id, change_seq) indexes alone; then only the kinds
   * with a change in the page are read, and only the rows that are sent. Reading limit + 1 whole
   * rows of every kind and keeping limit of them made each page read about three times its size.
   */
  async changedPage(em: EntityManager, clubId: string, since: number, limit: number): Promise<{ rows: WireRow[]; hasMore: boolean }> {
    const heads = ALL_KINDS.map((kind, i) =>
      `(SELECT ${i} AS k, change_seq AS s FROM ${q(tableOf(kind))} WHERE club_id = $1 AND change_seq > $2 ORDER BY change_seq LIMIT $3)`);
    const seqs: { k: number; s: string }[] = await em.query(
      `SELECT k, s FROM (${heads.join(' UNION ALL ')}) u ORDER BY s LIMIT $3`, [clubId, since, limit + 1]);
    const page = seqs.slice(0, limit);
    if (!page.length) return { rows: [], hasMore: false };
    const kinds = [...new Set(page.map((r) => r.k))].map((k) => ALL_KINDS[k]!);
    const rows: { k: number; change_seq: string; json: string; owner: string | null }[] = await em.query(
      `SELECT k, change_seq, json, owner FROM (${kinds.map((kind) => `(${wireSelect(kind)})`).join(' UNION ALL ')}) u ORDER BY change_seq`,
      [clubId, since, page[page.length - 1]!.s]);
    return {
      rows: rows.map((r) => ({ kind: ALL_KINDS[r.k]!, changeSeq: Number(r.change_seq), json: r.json, owner: r.owner })),
      hasMore: seqs.length > limit,
    };
  },

  /** How many of the club's records changed after `since`, of every kind, from the (club_id, change_seq) indexes alone. */
  async countChangedAfter(em: EntityManager, clubId: string, since: number): Promise<number> {
    const counts = ALL_KINDS.map((kind) => `(SELECT count(*) FROM ${q(tableOf(kind))} WHERE club_id = $1 AND change_seq > $2)`);
    const [row]: { n: string }[] = await em.query(`SELECT (${counts.join(' + ')})::bigint AS n`, [clubId, since]);
    return Number(row!.n);
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
