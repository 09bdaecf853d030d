import { ALL_KINDS, tableOf } from './columns.js';
import { batchInput } from './batch-input.js';
import { recordColumns, rowToRecord } from './record-rows.js';
const q = (name) => `"${name}"`;
/** Kind-table reads and writes as single multi-row statements, never one entity at a time. */
export const recordStore = {
    /**
     * Records of one kind with these ids, of any club: the caller refuses ids that belong to
     * another club. No row lock is needed: the push holds its club's lock, and only pushes and
     * settlements of that club write these rows.
     */
    async loadMany(em, kind, ids) {
        if (!ids.length)
            return [];
        const rows = await em.query(`SELECT * FROM ${q(tableOf(kind))} WHERE id = ANY($1::uuid[])`, [ids]);
        return rows.map((r) => rowToRecord(kind, r));
    },
    /**
     * Inserts or replaces records in one statement through json_to_recordset. The rows go as json,
     * not jsonb: jsonb input builds (and sorts the keys of) a binary copy of every row only to take
     * it apart again; json took about two thirds of the time for a 10,000-record push.
     */
    async upsertMany(em, kind, records) {
        if (!records.length)
            return;
        const params = [];
        await em.query(recordStore.upsertInto(kind, records, params), params);
    },
    /**
     * The upsert of upsertMany as SQL, its inputs appended to `params`, so that a caller can run it
     * as one part of a larger statement (the push writes records and change log in one).
     */
    upsertInto(kind, records, params) {
        const cols = recordColumns(kind);
        const { exprs, from } = batchInput(records, cols, params);
        const table = q(tableOf(kind));
        const names = cols.map((c) => q(c.name)).join(', ');
        const updates = cols.filter((c) => c.name !== 'id' && c.name !== 'club_id').map((c) => `${q(c.name)} = EXCLUDED.${q(c.name)}`).join(', ');
        return `INSERT INTO ${table} (${names}) SELECT ${exprs.join(', ')} FROM ${from}
       ON CONFLICT (id) DO UPDATE SET ${updates} WHERE ${table}.club_id = EXCLUDED.club_id`;
    },
    /**
     * The club's records changed after `since`, oldest change first, at most `limit` + 1 (the extra
     * one tells whether there is more). Each kind's (club_id, change_seq) index is scanned for at
     * most limit + 1 rows, so the cost follows the page size, not the history.
     */
    async changedAfter(em, clubId, since, limit) {
        const parts = ALL_KINDS.map((kind, i) => `(SELECT ${i} AS k, to_jsonb(t) AS row FROM ${q(tableOf(kind))} t WHERE club_id = $1 AND change_seq > $2 ORDER BY change_seq LIMIT $3)`);
        const rows = await em.query(`SELECT k, row FROM (${parts.join(' UNION ALL ')}) u ORDER BY (row->>'change_seq')::bigint LIMIT $3`, [clubId, since, limit + 1]);
        return rows.map(({ k, row }) => rowToRecord(ALL_KINDS[k], row));
    },
    /** Drops tombstones older than `before`; returns how many and the highest change seq removed. */
    async purgeTombstones(em, clubId, before) {
        let highest = 0;
        let count = 0;
        for (const kind of ALL_KINDS) {
            const [row] = await em.query(`WITH gone AS (DELETE FROM ${q(tableOf(kind))} WHERE club_id = $1 AND deleted AND updated_at < $2 RETURNING change_seq)
         SELECT count(*)::int AS n, coalesce(max(change_seq), 0) AS hi FROM gone`, [clubId, before]);
            highest = Math.max(highest, Number(row.hi));
            count += row.n;
        }
        return { highest, count };
    },
};
//# sourceMappingURL=record-store.js.map