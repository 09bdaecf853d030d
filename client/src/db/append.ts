import { buildMutation, encodeHlc, HybridClock, MAX_CLOCK_DRIFT_MS, type Fields, type LocalView, type RecordKind } from '@breakline/sync-protocol';
import type { ReplicaDb } from './schema';
import type { OutboxRow, RecordRow, ReplicaRow } from './types';
import { uuid7 } from './uuid7';
import { layerChange } from './view';

export interface AppendInput {
  clubId: string;
  kind: RecordKind;
  recordId: string;
  /** The record as shown now, read in this transaction; undefined for a new one. */
  row: RecordRow | undefined;
  view: LocalView | undefined;
  patch: Fields;
  deleted?: boolean;
  now: number;
  /** The replica row (loadReplica), read in this transaction. */
  replica: ReplicaRow;
}

/**
 * Queues one mutation and lays it on the record's row. Must run inside a rw transaction on
 * records, outbox and syncState, so the change, its outbox entry, the clock and the seq counter
 * are written together or not at all. The caller reads the row and the replica in that
 * transaction (side by side: each read waits for IndexedDB), and the three writes go out together;
 * `commit`, when given, is called as soon as they are issued (see write.ts).
 */
export async function appendMutation(db: ReplicaDb, input: AppendInput, commit?: () => void): Promise<OutboxRow> {
  const { replica } = input;
  // The clock is persisted, so an HLC never runs backwards across reloads even if the phone's time
  // does; but a clock left further ahead than the server takes (the phone's time was wrong and has
  // been put right) starts again from now, or every change until the wrong time came round again
  // would be refused. The device's own order is its seq, not its clock.
  const initial = replica.clock.l > input.now + MAX_CLOCK_DRIFT_MS ? { l: input.now, c: 0, node: replica.deviceId } : replica.clock;
  const clock = new HybridClock(replica.deviceId, { initial });
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
  const row = layerChange({ id: input.recordId, kind: input.kind, clubId: input.clubId }, input.row, entry);
  const written = Promise.all([
    db.outbox.add(entry),
    db.syncState.put({ ...replica, clock: clock.current(), seq }),
    db.records.put(row),
  ]);
  commit?.();
  await written;
  return entry;
}
