import type { KindFields } from '@breakline/sync-protocol';
import { createRecord, updateRecord, type WriteContext } from '@/db/write';

export interface MotorSave {
  /** null for a new motor. */
  motorId: string | null;
  fields: KindFields['motor'];
  /** The boat the motor was on before this save (null: the store, or a new motor). */
  fittedTo: string | null;
  /** Why it moved, when it moved; may be blank. */
  reason: string;
  now?: Date;
}

/**
 * Saves a motor and, when its boat changed, the move, in one local transaction: the motor's
 * record and its history of moves never disagree, even if the phone is shut mid-save.
 */
export function saveMotor(ctx: WriteContext, s: MotorSave): Promise<string> {
  const { db } = ctx;
  return db.transaction('rw', db.records, db.outbox, db.syncState, async () => {
    const id = s.motorId ?? (await createRecord(ctx, 'motor', s.fields));
    if (s.motorId) await updateRecord(ctx, 'motor', s.motorId, s.fields);
    if (s.fields.boatId !== s.fittedTo) {
      await createRecord(ctx, 'motorMove', {
        motorId: id, fromBoatId: s.fittedTo, toBoatId: s.fields.boatId, movedAt: (s.now ?? new Date()).toISOString(),
        movedBy: ctx.userId, reason: s.reason.trim(),
      });
    }
    return id;
  });
}
