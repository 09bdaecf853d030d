import { buildMutation, encodeHlc, HybridClock, type Fields, type LocalView, type RecordKind } from '@breakline/sync-protocol';
import { loadReplica } from './replica-state';
import type { ReplicaDb } from './schema';
import type { OutboxRow, RecordRow } from './types';
import { uuid7 } from './uuid7';
import { composeRow } from './view';

export interface AppendInput {
  clubId: string;
  kind: RecordKind;
  recordId: string;
  /** The record as shown now; undefined for a new one. */
  row: RecordRow | undefined;
  view: LocalView | undefined;
  patch: Fields;
  deleted?: boolean;
  now: number;
}

/**
 * Queues one mutation and recomposes the record's row. Must run inside a rw transaction on
 * records, outbox and syncState, so the change, its outbox entry, the clock and the seq counter
 * are written together or not at all.
 */
export async function appendMutation(db: ReplicaDb, input: AppendInput): Promise<OutboxRow> {
  const replica = await loadReplica(db, input.now);
  // The clock is persisted, so an HLC never runs backwards across reloads even if the phone's time does.
  const clock = new HybridClock(replica.deviceId, { initial: replica.clock });
  const hlc = encodeHlc(clock.now(input.now));
  const seq = replica.seq + 1;
  const mutation = buildMutation({
    mutationId: uuid7(input.now),
    seq,
    hlc,
    view: input.view,
    kind: input.kind,
    recordId: input.recordId,
    patch: input.patch,
    deleted: input.deleted,
  });
  const entry: OutboxRow = { seq, clubId: input.clubId, recordId: input.recordId, kind: input.kind, status: 'pending', mutation };
  await db.outbox.add(entry);
  await db.syncState.put({ ...replica, clock: clock.current(), seq });
  const entries = await db.outbox.where('recordId').equals(input.recordId).toArray();
  const server = input.row?.server ?? null;
  const row = composeRow({ id: input.recordId, kind: input.kind, clubId: input.clubId, server, gen: input.row?.gen }, entries);
  if (row) await db.records.put(row);
  return entry;
}
