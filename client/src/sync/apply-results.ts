import type { MutationResult, PushResponse } from '@breakline/sync-protocol';
import { markPhotosDue } from '@/db/photos';
import type { ReplicaDb } from '@/db/schema';
import type { ConflictSeenRow, OutboxRow, RejectedRow } from '@/db/types';
import { recomposeRows, stillShown } from '@/db/view';
import { photoRefs } from './photo-refs';

const LOST_REFUSAL = {
  code: 'invalid',
  message: 'Not taken on an earlier try, and the answer saying why was lost on the way. Send it again, or enter it again.',
} as const;

function rejectedRow(entry: OutboxRow, r: MutationResult, at: string): RejectedRow {
  const row: RejectedRow = {
    mutationId: entry.mutation.mutationId,
    clubId: entry.clubId,
    recordId: entry.recordId,
    kind: entry.kind,
    patch: entry.mutation.patch,
    error: r.error ?? { code: 'invalid', message: 'The server refused this change without saying why.' },
    at,
  };
  if (entry.mutation.deleted) row.deleted = true;
  return row;
}

/**
 * Marks a batch's answers in one transaction. Accepted changes (applied, merged, conflict, and a
 * duplicate whose record exists) leave the queue but stay shown until the pull brings their
 * version, and the photos they refer to become due for upload; a refused one moves to the
 * rejected list; one the server did not answer stays queued.
 */
export async function applyPushResults(db: ReplicaDb, batch: readonly OutboxRow[], response: PushResponse, at: string): Promise<void> {
  const byId = new Map(batch.map((e) => [e.mutation.mutationId, e]));
  await db.transaction('rw', [db.records, db.outbox, db.rejected, db.conflictsSeen, db.photos], async () => {
    const touched: string[] = [];
    const photos: string[] = [];
    for (const r of response.results) {
      const entry = byId.get(r.mutationId);
      if (!entry) continue;
      touched.push(entry.recordId);
      if (r.status === 'rejected') {
        await db.rejected.put(rejectedRow(entry, r, at));
        await db.outbox.delete(entry.seq);
        continue;
      }
      if (r.version === undefined) {
        // A duplicate of a change that left no record: a delete of one already gone is done; a
        // change that would have made or changed one was refused on an earlier try whose answer
        // was lost, before the server kept its refusals. It is kept in the refused list.
        if (!entry.mutation.deleted) await db.rejected.put(rejectedRow(entry, { ...r, error: LOST_REFUSAL }, at));
        await db.outbox.delete(entry.seq);
        continue;
      }
      photos.push(...photoRefs(entry.mutation.patch));
      const acked: OutboxRow = { ...entry, status: 'acked', ackVersion: r.version };
      const server = (await db.records.get(entry.recordId))?.server ?? null;
      if (stillShown(acked, server)) await db.outbox.put(acked);
      else await db.outbox.delete(entry.seq);
      const conflictIds = r.conflictIds ?? (r.conflictId ? [r.conflictId] : []);
      const seen: ConflictSeenRow[] = conflictIds.map((id) => ({
        id, clubId: entry.clubId, recordId: entry.recordId, kind: entry.kind, mutationId: r.mutationId, at,
      }));
      await db.conflictsSeen.bulkPut(seen);
    }
    await recomposeRows(db, touched);
    await markPhotosDue(db, photos);
  });
}
