import type { ConflictRecord, RecordKind } from '@breakline/sync-protocol';

export type ConflictRow = Record<string, any>;

const iso = (v: unknown) => (v ? new Date(v as string).toISOString() : undefined);

export function conflictFromRow(r: ConflictRow): ConflictRecord {
  const c: ConflictRecord = {
    id: r.id, clubId: r.club_id, recordId: r.record_id, kind: r.kind as RecordKind, field: r.field,
    keptValue: r.kept_value, overruledValue: r.overruled_value, kept: r.kept, overruled: r.overruled,
    status: r.status, createdAt: iso(r.created_at)!,
  };
  if (r.settled_by) Object.assign(c, { settledBy: r.settled_by, settledAt: iso(r.settled_at), settledValue: r.settled_value });
  if (r.note !== null && r.note !== undefined) c.note = r.note;
  return c;
}
