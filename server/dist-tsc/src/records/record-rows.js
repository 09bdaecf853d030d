import { fieldColumns } from './columns.js';
/** Row → the record shape the shared sync rules work on. */
export function rowToRecord(kind, row) {
    const fields = {};
    for (const c of fieldColumns(kind)) {
        const v = row[c.column];
        if (v === null && c.optional && !c.nullable)
            continue;
        fields[c.field] = v;
    }
    const lastActor = { deviceId: String(row.device_id), userId: String(row.updated_by) };
    if (row.updated_role)
        lastActor.role = row.updated_role;
    return {
        id: String(row.id), kind, clubId: String(row.club_id), version: Number(row.version), hlc: String(row.hlc),
        updatedAt: new Date(row.updated_at).toISOString(), deleted: row.deleted === true, fields,
        changeSeq: Number(row.change_seq), lastActor, fieldStamps: expandStamps(kind, row, lastActor),
    };
}
/** The sync columns every kind table has; the shareable ones are often one value for a whole batch. */
const SYNC_COLUMNS = [
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
];
const columnCache = new Map();
/** Record → the columns of its kind table, for writing records in bulk (see batchInput). */
export function recordColumns(kind) {
    let cols = columnCache.get(kind);
    if (!cols) {
        cols = [...SYNC_COLUMNS, ...fieldColumns(kind).map((c) => ({ name: c.column, type: c.type, get: (r) => r.fields[c.field] }))];
        columnCache.set(kind, cols);
    }
    return cols;
}
const sameStamp = (s, r) => s.hlc === r.hlc && s.actor.deviceId === r.lastActor.deviceId && s.actor.userId === r.lastActor.userId && s.actor.role === r.lastActor.role;
/**
 * Per-field stamps are kept only where they differ from the record's last write, which is most
 * fields after a create: storing all of them made a push write several times the bytes. None
 * left (undefined) is stored as {}.
 */
function compactStamps(r) {
    let out;
    for (const f in r.fieldStamps) {
        const s = r.fieldStamps[f];
        if (!sameStamp(s, r))
            (out ??= {})[f] = s;
    }
    return out;
}
/**
 * The inverse: a field with no stamp of its own was written by the record's last write. Every
 * field gets its stamp back, so the next write cannot move the unstated ones to itself.
 */
function expandStamps(kind, row, lastActor) {
    const out = { ...(row.field_stamps ?? {}) };
    const fallback = { actor: lastActor, hlc: String(row.hlc) };
    for (const { field } of fieldColumns(kind))
        out[field] ??= fallback;
    out.deleted ??= fallback;
    return out;
}
//# sourceMappingURL=record-rows.js.map