import { checkCreate, checkDelete, checkUpdate, deepEqual, validateRecord } from '@breakline/sync-protocol';
import { appendMutation } from './append';
import { localWrites } from './events';
import { loadReplica } from './replica-state';
import type { RejectedRow } from './types';
import { toLocalView } from './view';
import { guard, invalid, validPatch, type WriteContext } from './write';
import { LocalWriteError } from './write-error';

// Apart from write.ts, which every screen loads: only the sync details ask for this.

/**
 * Queues a refused change again, as the person made it, with a fresh clock stamp: after the
 * phone's time was put right, or a supervisor entered what a crew member could not. The same
 * rules apply as to a new change, so one that is still not allowed is refused here with the
 * reason, and stays in the refused list. A refused new record is made again under its own id.
 */
export async function resendRejected(ctx: WriteContext, rejected: RejectedRow): Promise<void> {
  const { db } = ctx;
  const { kind, recordId: id, patch } = rejected;
  if (rejected.clubId !== ctx.clubId) throw new LocalWriteError('forbidden', 'This change belongs to another club; switch to that club to send it again.');
  await db.transaction('rw', db.records, db.outbox, db.syncState, db.rejected, async () => {
    const now = (ctx.now ?? Date.now)();
    const [row, replica] = await Promise.all([db.records.get(id), loadReplica(db, now)]);
    const shown = row && row.clubId === ctx.clubId && !row.deleted ? row : undefined;
    if (row && !shown) throw new LocalWriteError('not-found', 'This record is not on this phone any more; it may have been deleted.');
    if (shown && shown.kind !== kind) throw new LocalWriteError('invalid', `This record is a ${shown.kind}, not a ${kind}.`);
    const base = { clubId: ctx.clubId, kind, recordId: id, row: shown, view: shown && toLocalView(shown), now, replica };
    if (!shown) {
      if (rejected.deleted) {
        await db.rejected.delete(rejected.mutationId); // the record it would delete is gone already
        return;
      }
      const valid = validateRecord(kind, patch);
      if (!valid.ok) throw invalid(valid.errors);
      guard(checkCreate(kind, ctx.role, valid.value, ctx.userId));
      await appendMutation(db, { ...base, patch: valid.value }, () => undefined);
    } else if (rejected.deleted) {
      guard(checkDelete(kind, ctx.role, shown.fields, ctx.userId));
      await appendMutation(db, { ...base, patch: {}, deleted: true }, () => undefined);
    } else {
      const changed = Object.fromEntries(Object.entries(validPatch(kind, patch)).filter(([f, v]) => !deepEqual(v, shown.fields[f])));
      if (Object.keys(changed).length > 0) {
        const whole = validateRecord(kind, { ...shown.fields, ...changed });
        if (!whole.ok) throw invalid(whole.errors);
        guard(checkUpdate(kind, ctx.role, changed, shown.fields, ctx.userId));
        await appendMutation(db, { ...base, patch: changed }, () => undefined);
      }
    }
    await db.rejected.delete(rejected.mutationId);
  });
  localWrites.notify(ctx.clubId);
}
