const iso = (v) => (v ? new Date(v).toISOString() : undefined);
export function conflictFromRow(r) {
    const c = {
        id: r.id, clubId: r.club_id, recordId: r.record_id, kind: r.kind, field: r.field,
        keptValue: r.kept_value, overruledValue: r.overruled_value, kept: r.kept, overruled: r.overruled,
        status: r.status, createdAt: iso(r.created_at),
    };
    if (r.settled_by)
        Object.assign(c, { settledBy: r.settled_by, settledAt: iso(r.settled_at), settledValue: r.settled_value });
    if (r.note !== null && r.note !== undefined)
        c.note = r.note;
    return c;
}
//# sourceMappingURL=conflict-rows.js.map