import { PROTOCOL_VERSION, type PushRequest, type PushResponse } from '@breakline/sync-protocol';
import { loadReplica } from '@/db/replica-state';
import type { ReplicaDb } from '@/db/schema';
import { ApiError } from '@/lib/api-error';
import { applyPushResults } from './apply-results';
import type { ProgressListener } from './progress';
import { syncRequest, type TransportContext } from './transport';

/** A phone's batch stays small enough to send on one bar of signal. */
export const PUSH_BATCH = 500;

export const TOO_LARGE_ALONE =
  'This change is larger than the server takes in one request, so it cannot be sent as it is. Enter it again in shorter parts, or ask your club admin.';

export interface PushContext extends TransportContext {
  db: ReplicaDb;
  now: () => number;
  batchSize?: number;
  onProgress?: ProgressListener;
}

function isPushResponse(value: unknown): value is PushResponse {
  const v = value as PushResponse | null;
  return typeof v === 'object' && v !== null && Array.isArray(v.results) && typeof v.lastSeq === 'number';
}

/** Sends the club's queued changes oldest first, a batch at a time, until none are left. */
export async function pushOutbox(ctx: PushContext): Promise<void> {
  const { db, scope } = ctx;
  const limit = Math.min(ctx.batchSize ?? PUSH_BATCH, PUSH_BATCH);
  const pending = () => db.outbox.where('[clubId+status]').equals([scope.clubId, 'pending']);
  const total = await pending().count();
  if (total === 0) return;
  const { deviceId } = await db.transaction('rw', db.syncState, () => loadReplica(db, ctx.now()));
  let done = 0;
  ctx.onProgress?.({ phase: 'sending', done, total });
  // Halved while the server says a batch is too large (413), so the queue still empties.
  let size = limit;
  for (;;) {
    // Equal index keys come back in primary-key order, so this is seq order.
    const batch = await pending().limit(size).toArray();
    if (batch.length === 0) return;
    const body: PushRequest = { protocolVersion: PROTOCOL_VERSION, deviceId, mutations: batch.map((e) => e.mutation) };
    let answer: unknown;
    try {
      answer = await syncRequest<unknown>(ctx, '/api/sync/push', body);
    } catch (e) {
      if (!(e instanceof ApiError) || e.status !== 413) throw e;
      if (batch.length > 1) {
        size = Math.ceil(batch.length / 2);
        continue;
      }
      // One change alone is over the limit: it would be refused on every try, and hold up the rest.
      // The rest may well go in full batches again.
      size = limit;
      answer = { results: [{ mutationId: batch[0]!.mutation.mutationId, status: 'rejected', error: { code: 'invalid', message: TOO_LARGE_ALONE } }], lastSeq: 0 };
    }
    if (!isPushResponse(answer)) throw new ApiError(200, 'bad_response', 'The server sent a push answer Breakline cannot read.');
    await applyPushResults(db, batch, answer, new Date(ctx.now()).toISOString());
    const after = await db.outbox.bulkGet(batch.map((e) => e.seq));
    const settled = after.filter((e) => e?.status !== 'pending').length;
    // An answer that settles none of the batch would send it again for ever.
    if (settled === 0) throw new ApiError(200, 'bad_response', 'The server answered the push without taking any change.');
    done += settled;
    // Changes made while this runs join the count rather than leaving it at "12 of 10".
    ctx.onProgress?.({ phase: 'sending', done, total: done + (await pending().count()) });
  }
}
