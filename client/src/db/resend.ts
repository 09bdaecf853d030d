import type { KindFields } from '@breakline/sync-protocol';
import type { RejectedRow } from './types';
import { createRecordAs, deleteRecord, updateRecord, type WriteContext } from './write';
import { LocalWriteError } from './write-error';

// Apart from write.ts, which every screen loads: only the sync details ask for this.

/**
 * Queues a refused change again, as the person made it, with a fresh clock stamp: after the
 * phone's time was put right, or a supervisor entered what a crew member could not. It goes
 * through the same writes as a new change, so one that is still not allowed is refused here with
 * the reason, and stays in the refused list. A refused new record is made again under its own id.
 */
export async function resendRejected(ctx: WriteContext, rejected: RejectedRow): Promise<void> {
  const { db } = ctx;
  const { kind, recordId: id, patch } = rejected;
  if (rejected.clubId !== ctx.clubId) throw new LocalWriteError('forbidden', 'This change belongs to another club; switch to that club to send it again.');
  // One transaction: the writes below join it, so the change is queued again and leaves the
  // refused list together, or neither.
  await db.transaction('rw', db.records, db.outbox, db.syncState, db.rejected, async () => {
    const row = await db.records.get(id);
    if (!row) {
      // A delete of a record already gone has nothing left to do.
      if (!rejected.deleted) await createRecordAs(ctx, kind, id, patch as KindFields[typeof kind]);
    } else if (rejected.deleted) {
      await deleteRecord(ctx, kind, id);
    } else {
      await updateRecord(ctx, kind, id, patch);
    }
    await db.rejected.delete(rejected.mutationId);
  });
}
