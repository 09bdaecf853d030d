import { overlayPending, type LocalView, type RecordKind, type SyncRecord } from '@breakline/sync-protocol';
import type { ReplicaDb } from './schema';
import { NO_BOAT, type OutboxRow, type RecordRow } from './types';

/** An accepted change stays on top only until the pulled copy reaches the version it made. */
export function stillShown(entry: OutboxRow, server: SyncRecord | null): boolean {
  return entry.status === 'pending' || (server?.version ?? 0) < (entry.ackVersion ?? Infinity);
}

/** The row a screen reads: the server's copy with the queued edits reapplied in seq order. */
export function composeRow(
  base: { id: string; kind: RecordKind; clubId: string; server: SyncRecord | null; gen?: number },
  entries: readonly OutboxRow[],
): RecordRow | undefined {
  const shown = entries.filter((e) => stillShown(e, base.server)).sort((a, b) => a.seq - b.seq);
  const changes = shown.map((e) => ({ patch: e.mutation.patch, deleted: e.mutation.deleted }));
  // With nothing on top, the shown fields are the server's copy itself, not a copy of it: the
  // row is then cloned into IndexedDB with the fields once, not twice (a structured clone keeps
  // a shared object shared), which is half of a first sync's time in bulkPut.
  const view = shown.length === 0 && base.server
    ? { version: base.server.version, fields: base.server.fields, deleted: base.server.deleted }
    : overlayPending(base.id, base.kind, base.server ?? undefined, changes);
  if (!view) return undefined;
  return rowOf(base, { ...view, waiting: shown.filter((e) => e.status === 'pending').length });
}

/** A row from its identity, pulled copy and generation and what it shows; boatId copied out for its index (NO_BOAT without one). */
function rowOf(
  base: { id: string; kind: RecordKind; clubId: string; server: SyncRecord | null; gen?: number },
  shown: Pick<RecordRow, 'version' | 'fields' | 'deleted' | 'waiting'>,
): RecordRow {
  const row: RecordRow = {
    id: base.id, kind: base.kind, clubId: base.clubId, server: base.server,
    version: shown.version, fields: shown.fields, deleted: shown.deleted, waiting: shown.waiting,
    boatId: typeof shown.fields.boatId === 'string' ? shown.fields.boatId : NO_BOAT,
  };
  if (base.gen !== undefined) row.gen = base.gen;
  return row;
}

/**
 * The row once `entry`, just queued, is laid on top: what composeRow gives with the entry added
 * to the record's queued ones, without reading them again. It holds because every transaction
 * that changes a record's pulled copy or its queue recomposes the row before it commits, so the
 * row read in this transaction is already that composition. `row` is undefined for a new record.
 */
export function layerChange(
  base: { id: string; kind: RecordKind; clubId: string },
  row: RecordRow | undefined,
  entry: OutboxRow,
): RecordRow {
  return rowOf({ ...base, server: row?.server ?? null, gen: row?.gen }, {
    version: row?.version ?? 0,
    // The mutation holds its own copy of the patch, so the row shares nothing with the caller.
    fields: { ...row?.fields, ...entry.mutation.patch },
    deleted: (row?.deleted ?? false) || entry.mutation.deleted === true,
    waiting: (row?.waiting ?? 0) + 1,
  });
}

export function toLocalView(row: RecordRow): LocalView {
  return { id: row.id, kind: row.kind, version: row.version, fields: row.fields, deleted: row.deleted, pending: row.waiting };
}

/**
 * Recomposes the rows of `recordIds` from what the tables hold now. Call inside a rw transaction
 * on records and outbox. A record with neither a server copy nor a queued change is removed
 * (a refused create), the refusal itself being kept in the rejected list.
 */
export async function recomposeRows(db: ReplicaDb, recordIds: readonly string[]): Promise<void> {
  const ids = [...new Set(recordIds)];
  const rows = await db.records.bulkGet(ids);
  const entries = await db.outbox.where('recordId').anyOf(ids).toArray();
  const puts: RecordRow[] = [];
  const gone: string[] = [];
  ids.forEach((id, i) => {
    const row = rows[i];
    if (!row) return;
    const next = composeRow(row, entries.filter((e) => e.recordId === id));
    if (next) puts.push(next);
    else gone.push(id);
  });
  await db.records.bulkPut(puts);
  await db.records.bulkDelete(gone);
}
