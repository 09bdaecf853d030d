import { decodeHlc, HybridClock, type PullResponse, type SyncRecord } from '@breakline/sync-protocol';
import { clubRows } from '@/db/queries';
import { loadClubState, loadReplica } from '@/db/replica-state';
import type { ReplicaDb } from '@/db/schema';
import type { OutboxRow, RecordRow, ReplicaRow } from '@/db/types';
import { composeRow, recomposeRows, stillShown } from '@/db/view';

/** The clock follows what others wrote, so this phone's next edit is ordered after what it saw. */
function receiveClocks(replica: ReplicaRow, changes: readonly SyncRecord[], now: number): ReplicaRow {
  // No drift limit here: the server already refused clocks far ahead, and a phone whose own time
  // is behind must still move past what it has seen.
  const clock = new HybridClock(replica.deviceId, { initial: replica.clock, maxDriftMs: Number.POSITIVE_INFINITY });
  for (const c of changes) {
    try {
      clock.receive(decodeHlc(c.hlc), now);
    } catch {
      // A malformed clock on one record must not stop the page; ordering only loses a tie-break.
    }
  }
  return { ...replica, clock: clock.current() };
}

/** After the last page: every accepted change is in the pulled copies now; a reset sweeps the rest. */
async function finishPull(db: ReplicaDb, clubId: string, sweepBelow: number | undefined): Promise<void> {
  const acked = await db.outbox.where('[clubId+status]').equals([clubId, 'acked']).toArray();
  await db.outbox.bulkDelete(acked.map((e) => e.seq));
  await recomposeRows(db, acked.map((e) => e.recordId));
  if (sweepBelow === undefined) return;
  const stale = await clubRows(db, clubId).filter((r) => (r.gen ?? 0) < sweepBelow).toArray();
  const held = new Set((await db.outbox.where('recordId').anyOf(stale.map((r) => r.id)).toArray()).map((e) => e.recordId));
  await db.records.bulkDelete(stale.filter((r) => !held.has(r.id)).map((r) => r.id));
}

/**
 * Writes one page with bulkPut and moves the checkpoint in the same transaction, so a page is
 * either all in with its checkpoint or not at all. Queued edits are laid on top of each pulled
 * copy before it is written, so a screen never sees the edit disappear and come back.
 *
 * A pulled copy older than the one held is not written over it. `fromEmpty` says the pull began
 * with no record of the club on this phone and no checkpoint (at generation `gen`): every server
 * copy held was then written by an earlier page of this same pull, from an older change, so there
 * is nothing to compare with and the held rows are not read (on a first sync that read was a
 * fifth of the time). The page's rows are then put at once, right after the few small reads the
 * page needs: a transaction's requests run in order, so the reads answer while the rows are still
 * being written, and the checkpoint's writes queue behind them; nothing waits on the big put but
 * the commit. Rows with queued edits are put again, composed, in the same transaction; no screen
 * sees the first put.
 */
export async function applyPullPage(
  db: ReplicaDb, clubId: string, page: PullResponse, now: number, { fromEmpty }: { fromEmpty?: { gen: number } } = {},
): Promise<void> {
  await db.transaction('rw', db.records, db.outbox, db.syncState, async () => {
    const changes = page.changes.filter((c) => c.clubId === clubId);
    const ids = changes.map((c) => c.id);
    const reads = Promise.all([
      loadClubState(db, clubId),
      loadReplica(db, now),
      db.outbox.where('recordId').anyOf(ids).toArray(),
      fromEmpty ? [] : db.records.bulkGet(ids),
    ]);
    const early = fromEmpty
      ? db.records.bulkPut(changes.map((change) => composeRow({ id: change.id, kind: change.kind, clubId, server: change, gen: fromEmpty.gen }, [])!))
      : undefined;
    // Were the put to fail, the transaction fails with it and the awaits below say so first.
    early?.catch(() => undefined);
    const [state, replica, entries, existing] = await reads;
    const byRecord = new Map<string, OutboxRow[]>();
    for (const e of entries) {
      const mine = byRecord.get(e.recordId);
      if (mine) mine.push(e);
      else byRecord.set(e.recordId, [e]);
    }
    const rows: RecordRow[] = [];
    const done: OutboxRow[] = [];
    changes.forEach((change, i) => {
      const mine = byRecord.get(change.id) ?? [];
      if (early && mine.length === 0) return; // already put as it came
      const prev = existing[i]?.server;
      const server = prev && prev.version > change.version ? prev : change;
      done.push(...mine.filter((e) => !stillShown(e, server)));
      const row = composeRow({ id: change.id, kind: change.kind, clubId, server, gen: state.gen }, mine);
      if (row) rows.push(row);
    });
    const writes: Promise<unknown>[] = [];
    if (early) writes.push(early);
    if (rows.length) writes.push(db.records.bulkPut(rows));
    if (done.length) writes.push(db.outbox.bulkDelete(done.map((e) => e.seq)));
    writes.push(db.syncState.put(receiveClocks(replica, changes, now)));
    writes.push(db.syncState.put({ ...state, checkpoint: page.checkpoint, sweepBelow: page.hasMore ? state.sweepBelow : undefined }));
    await Promise.all(writes);
    if (!page.hasMore) await finishPull(db, clubId, state.sweepBelow);
  });
}
